import { startTransition, StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { BrowserRouter } from 'react-router-dom';
import { AppProvider } from '@/app/provider';
import { AppRoutes } from '@/app/app-routes';
import { readClubLocaleFromPage } from '@/lib/club-locale';
import '@/styles/index.css';

readClubLocaleFromPage();

const rootElement = document.getElementById('root');
if (!rootElement) throw new Error('index.html has no #root element');

// The first render runs as a transition, so React yields to the browser between pieces of work instead of
// holding the main thread for the whole tree (long tasks are what a phone on a slow CPU feels as a stall).
const root = createRoot(rootElement);
startTransition(() => {
  root.render(
    <StrictMode>
      <AppProvider>
        <BrowserRouter>
          <AppRoutes />
        </BrowserRouter>
      </AppProvider>
    </StrictMode>,
  );
});
