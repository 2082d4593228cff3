/** The frequency panel (placeholder until the frequency view lands). */
export function FrequencyPanel() {
  return <section aria-label="frequency response" className="pw-panel" />;
}
