import '@fontsource-variable/inter';
// sonner also injects these styles at runtime; shipping them as a file keeps toasts styled under a CSP
// that refuses inline <style>.
import 'sonner/dist/styles.css';
import './index.css';
import { StrictMode } from 'react';
import { z } from 'zod';
import { createRoot } from 'react-dom/client';
import { AppProvider } from './app/provider';
import { AppRouter } from './app/router';

// zod would probe for eval support, which our CSP (no 'unsafe-eval') reports as a violation on every page.
z.config({ jitless: true });

const container = document.getElementById('root');
if (!container) throw new Error('index.html has no #root element');

createRoot(container).render(
  <StrictMode>
    <AppProvider>
      <AppRouter />
    </AppProvider>
  </StrictMode>,
);
