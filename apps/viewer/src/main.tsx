import { hydrate, type DehydratedState } from '@tanstack/react-query';
import { StrictMode } from 'react';
import { createRoot, hydrateRoot } from 'react-dom/client';
import { RouterProvider } from 'react-router-dom';
import { AppProviders } from './app/providers.tsx';
import { createViewerRouter } from './app/router.tsx';
import { FIRST_HTML_QUERIES_ID } from './first-html.ts';
import { createQueryClient } from '@vatside/ui/query-client.ts';
import './index.css';

/** The API answers a first HTML from the server was written from (see entry-server.tsx). */
function firstHtmlQueries(): DehydratedState | undefined {
  const data = document.getElementById(FIRST_HTML_QUERIES_ID)?.textContent;
  return data ? (JSON.parse(data) as DehydratedState) : undefined;
}

async function start() {
  const root = document.getElementById('root');
  if (!root) throw new Error('index.html has no #root element');
  const queryClient = createQueryClient();
  const firstHtml = firstHtmlQueries();
  if (firstHtml) hydrate(queryClient, firstHtml);
  const router = await createViewerRouter(firstHtml !== undefined);
  const app = (
    <StrictMode>
      <AppProviders queryClient={queryClient}>
        <RouterProvider router={router} />
      </AppProviders>
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
