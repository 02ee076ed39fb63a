import '@fontsource/lexend/400.css';
import '@fontsource/lexend/600.css';
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { App } from './app/app';
import { keepSessionFresh, restoreSession } from './lib/session-api';

const container = document.getElementById('root');
if (!container) throw new Error('index.html has no #root element');

// A reload or a new tab is signed in again from the refresh cookie, if its session is still live.
keepSessionFresh();
void restoreSession();

createRoot(container).render(
  <StrictMode>
    <App />
  </StrictMode>,
);
