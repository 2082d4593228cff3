import './views/theme.css';
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { App } from './views/App.tsx';
import { installPersistence } from './store/persist.ts';
import { workbenchStore } from './store/useWorkbench.ts';

installPersistence(workbenchStore);

const container = document.getElementById('root');
if (!container) throw new Error('Polewright: the page has no #root element.');
createRoot(container).render(
  <StrictMode>
    <App />
  </StrictMode>,
);
