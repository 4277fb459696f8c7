import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import './styles/index.css';
import { App } from './app';
import { api } from './lib/api-client';

// Fetch the CSRF token while the first screen loads, so the first form submission does not wait for it.
void api.refreshCsrfToken().catch(() => undefined);

const container = document.getElementById('root');
if (!container) throw new Error('index.html has no #root element');
createRoot(container).render(
  <StrictMode>
    <App />
  </StrictMode>,
);
