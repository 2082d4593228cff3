/** The time panel (placeholder until the time view lands). */
export function TimePanel() {
  return <section aria-label="time response" className="pw-panel" />;
}
