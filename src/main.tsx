import './views/theme.css';
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { App } from './views/App.tsx';
import { browserEnv, installPersistence } from './store/persist.ts';
import { workbenchStore } from './store/useWorkbench.ts';
import { downloadDesignFile } from './views/side/share/saveDesign.ts';

const persistence = installPersistence(workbenchStore, {
  ...browserEnv(),
  downloadDesign: downloadDesignFile,
});

const container = document.getElementById('root');
if (!container) throw new Error('Polewright: the page has no #root element.');
// The first view shows the restored design, never the demo in its place: a session only the full design
// reader can read (an older version's) waits for it; what the workbench wrote itself is there at once.
const render = () =>
  createRoot(container).render(
    <StrictMode>
      <App />
    </StrictMode>,
  );
// The address bar follows the design from the restored (or linked) one on; it needs the link codec, which
// is not in the first view either, so it loads with it after the first paint.
const start = () => {
  render();
  void import('./store/addressBar.ts').then((m) =>
    m.installAddressBar(workbenchStore, m.browserAddressEnv()),
  );
};
void persistence.restored.then(start, start);
