import '@fontsource-variable/inter';
// sonner also injects these styles at runtime; shipping them as a file keeps toasts styled under a CSP
// that refuses inline <style>.
import 'sonner/dist/styles.css';
import './index.css';
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { AppProvider } from './app/provider';
import { AppRouter } from './app/router';

const container = document.getElementById('root');
if (!container) throw new Error('index.html has no #root element');

createRoot(container).render(
  <StrictMode>
    <AppProvider>
      <AppRouter />
    </AppProvider>
  </StrictMode>,
);
