import './views/theme.css';
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { App } from './views/App.tsx';
import { browserEnv, installPersistence } from './store/persist.ts';
import { workbenchStore } from './store/useWorkbench.ts';
import { downloadDesignFile } from './views/side/share/saveDesign.ts';

installPersistence(workbenchStore, { ...browserEnv(), downloadDesign: downloadDesignFile });

const container = document.getElementById('root');
if (!container) throw new Error('Polewright: the page has no #root element.');
createRoot(container).render(
  <StrictMode>
    <App />
  </StrictMode>,
);
