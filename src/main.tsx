import '@fontsource/merriweather/latin-400.css';
import '@fontsource/merriweather/latin-700.css';
import './index.css';
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { App } from './app/app';
import { registerServiceWorker } from './lib/service-worker';

createRoot(document.getElementById('root')!).render(
  <StrictMode>
    <App />
  </StrictMode>,
);

registerServiceWorker();
