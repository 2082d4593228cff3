/** The z-plane panel (placeholder until the plane lands). */
export function ZPlanePanel() {
  return <section aria-label="z-plane" className="pw-panel" />;
}
