import { hydrate } from '@tanstack/react-query';
import { StrictMode } from 'react';
import { createRoot, hydrateRoot } from 'react-dom/client';
import { RouterProvider } from 'react-router-dom';
import { AppProviders } from './app/providers.tsx';
import { createViewerRouter } from './app/router.tsx';
import { FIRST_HTML_DATA_ID, type FirstHtmlData } from './first-html.ts';
import { FirstHtmlTimeZone, rememberTimeZone } from './hooks/use-device-time-zone.ts';
import { createQueryClient } from '@vatside/ui/query-client.ts';
import './index.css';

/** What a first HTML from the server was written from (see entry-server.tsx). */
function firstHtmlData(): FirstHtmlData | undefined {
  const data = document.getElementById(FIRST_HTML_DATA_ID)?.textContent;
  return data ? (JSON.parse(data) as FirstHtmlData) : undefined;
}

async function start() {
  const root = document.getElementById('root');
  if (!root) throw new Error('index.html has no #root element');
  const queryClient = createQueryClient();
  rememberTimeZone();
  const firstHtml = firstHtmlData();
  if (firstHtml) hydrate(queryClient, firstHtml.queries);
  const router = await createViewerRouter(firstHtml !== undefined);
  const app = (
    <StrictMode>
      <FirstHtmlTimeZone.Provider value={firstHtml?.timeZone ?? 'UTC'}>
        <AppProviders queryClient={queryClient}>
          <RouterProvider router={router} />
        </AppProviders>
      </FirstHtmlTimeZone.Provider>
    </StrictMode>
  );
  if (!firstHtml) {
    createRoot(root).render(app);
    return;
  }
  hydrateRoot(root, app, {
    // React recovers by drawing the part again; the message makes a mismatch easy to find.
    onRecoverableError: (error) => console.error('Vatside: the first HTML was redrawn:', error),
  });
}

void start();
