import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import '@fontsource/nunito/latin-400.css';
import '@fontsource/nunito/latin-600.css';
import '@fontsource/nunito/latin-800.css';
import './index.css';
import { registerSW } from 'virtual:pwa-register';
import { App } from './app/app';

const root = document.getElementById('root');
if (!root) throw new Error('The page has no #root element');

createRoot(root).render(
  <StrictMode>
    <App />
  </StrictMode>,
);

// Keep the app shell on the device for a dead connection; a new version takes over on the next load.
if ('serviceWorker' in navigator) registerSW({ immediate: true });
