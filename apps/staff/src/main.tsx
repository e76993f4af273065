import '@fontsource/nunito/latin-400.css';
import '@fontsource/nunito/latin-600.css';
import '@fontsource/nunito/latin-800.css';
import './index.css';
import { mountApp } from '@fryline/ui';
import { registerSW } from 'virtual:pwa-register';
import { App } from './app/app';

mountApp(<App />);

// Keep the app shell on the device for a dead connection; a new version takes over on the next load.
if ('serviceWorker' in navigator) registerSW({ immediate: true });
