import '@fontsource/nunito/latin-400.css';
import '@fontsource/nunito/latin-600.css';
import '@fontsource/nunito/latin-800.css';
import './index.css';
import { mountApp } from '@fryline/ui';
import { App } from './app/app';

mountApp(<App />);
