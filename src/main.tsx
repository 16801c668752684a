import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import '@fontsource/source-sans-3/400.css';
import '@fontsource/source-sans-3/600.css';
import '@fontsource/source-sans-3/700.css';
import './styles.css';
import { App } from './app';

const rootElement = document.getElementById('root');
if (!rootElement) throw new Error('The page has no #root element to render into.');

createRoot(rootElement).render(
  <StrictMode>
    <App />
  </StrictMode>,
);
