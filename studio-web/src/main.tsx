// Browser entry: styles (theme, bundled mono face, app rules), then the app.
import '@radix-ui/themes/styles.css';
import '@fontsource/jetbrains-mono/400.css';
import '@fontsource/jetbrains-mono/500.css';
import './styles/global.css';
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { App } from './app/app';

const container = document.getElementById('root');
if (!container) throw new Error('index.html has no element with id "root" to mount the app in.');

createRoot(container).render(
  <StrictMode>
    <App />
  </StrictMode>,
);
