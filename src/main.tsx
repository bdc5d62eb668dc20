/// <reference types="vite-plugin-pwa/client" />
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import '@fontsource/ibm-plex-sans/400.css';
import '@fontsource/ibm-plex-sans/500.css';
import '@fontsource/ibm-plex-sans/600.css';
import './styles.css';
import { AppProvider } from './app/provider';

const root = document.getElementById('root');
if (!root) throw new Error('The page has no #root element.');

// The service worker keeps the app and tonight's data for the cab; production builds only.
if (import.meta.env.PROD && 'serviceWorker' in navigator) {
  void import('virtual:pwa-register').then(({ registerSW }) => registerSW({ immediate: true }));
}

createRoot(root).render(
  <StrictMode>
    <AppProvider />
  </StrictMode>,
);
