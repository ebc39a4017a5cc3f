import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
// Regular and semibold are the only weights the interface uses; bundled, so no font host is asked.
import '@fontsource/source-sans-3/400.css';
import '@fontsource/source-sans-3/600.css';
import './styles.css';
import { AppProvider } from './app/provider';

const root = document.getElementById('root');
if (!root) throw new Error('index.html has no #root element');

createRoot(root).render(
  <StrictMode>
    <AppProvider />
  </StrictMode>,
);
