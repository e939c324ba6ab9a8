// Latin subset, regular and bold only: the two weights the app uses, kept small for phones.
import '@fontsource/atkinson-hyperlegible/latin-400.css';
import '@fontsource/atkinson-hyperlegible/latin-700.css';
import './styles/global.css';

import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { App } from './app/App';
import { resumeStoredSession } from './realtime';

const rootElement = document.getElementById('root');
if (!rootElement) throw new Error('Missing #root element in index.html');

// Before the first render, so a reload with a stored token never flashes the join form.
resumeStoredSession();

createRoot(rootElement).render(
  <StrictMode>
    <App />
  </StrictMode>,
);
