/** Placeholder shell of the workbench; the panels arrive with the workbench work. */
export function App() {
  return (
    <main>
      <h1>Polewright</h1>
      <p>Digital filter workbench.</p>
    </main>
  );
}
