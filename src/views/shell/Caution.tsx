/** The standing caution about using results from this page. */
export function Caution() {
  return (
    <footer className="pw-caution">
      <strong>Check before you ship:</strong> every figure here is a model. Verify the filter on the target
      hardware with real signals; for medical, machine-control or safety-related uses, qualify it under the
      standards that apply and through licensed engineering review.
    </footer>
  );
}
