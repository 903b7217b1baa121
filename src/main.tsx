import '@fontsource-variable/inter';
import '@fontsource-variable/source-serif-4';
import './styles.css';
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { AppProvider } from './app/provider.tsx';
import { AppRouter } from './app/router.tsx';
import { applyStoredTheme } from './lib/theme.ts';

applyStoredTheme();

createRoot(document.getElementById('root')!).render(
  <StrictMode>
    <AppProvider>
      <AppRouter />
    </AppProvider>
  </StrictMode>,
);
