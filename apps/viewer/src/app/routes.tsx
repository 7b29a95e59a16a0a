import type { RouteObject } from 'react-router-dom';
import { accountRoutes } from '@vatside/ui/account/account-routes';
import { LoadingBlock } from '@vatside/ui/LoadingBlock';
import { AppShell } from './shell.tsx';
import { RouteError } from './route-error.tsx';

/**
 * What the server may write a route's first HTML for: the pages a phone lands on from a link,
 * which read only the API and the asker's session. The follow-along's first HTML is its run
 * sheets; the live state follows over the socket once the scripts run. Forms and sign-in start
 * in the browser.
 */
export interface ViewerRouteHandle {
  firstHtml?: { status: 200 | 404 };
}

const firstHtml = (status: 200 | 404 = 200): ViewerRouteHandle => ({ firstHtml: { status } });

/** The viewer's route tree as data. Route modules load lazily and export `Component`. */
export const routes: RouteObject[] = [
  {
    path: '/',
    element: <AppShell />,
    errorElement: <RouteError />,
    hydrateFallbackElement: <LoadingBlock label="Opening Vatside…" />,
    children: [
      {
        // Keeps the shell around a failing screen.
        errorElement: <RouteError />,
        children: [
          { index: true, handle: firstHtml(), lazy: () => import('./routes/welcome.tsx') },
          ...accountRoutes,
          { path: 's/:slug', handle: firstHtml(), lazy: () => import('./routes/studio-page.tsx') },
          { path: 's/:slug/live', lazy: () => import('./routes/studio-live.tsx') },
          {
            path: 's/:slug/dye-alongs/:dyeAlongId',
            handle: firstHtml(),
            lazy: () => import('./routes/studio-dye-along.tsx'),
          },
          {
            path: 's/:slug/dye-alongs/:dyeAlongId/share',
            lazy: () => import('./routes/share-skein.tsx'),
          },
          { path: 's/:slug/my-skeins', lazy: () => import('./routes/my-skeins.tsx') },
          {
            path: 's/:slug/dye-alongs/:dyeAlongId/gallery',
            handle: firstHtml(),
            lazy: () => import('./routes/studio-gallery.tsx'),
          },
          {
            path: 's/:slug/dye-alongs/:dyeAlongId/gallery/:skeinId',
            handle: firstHtml(),
            lazy: () => import('./routes/studio-gallery-skein.tsx'),
          },
          { path: 'unsubscribe', lazy: () => import('./routes/unsubscribe.tsx') },
          { path: '*', handle: firstHtml(404), lazy: () => import('./routes/not-found.tsx') },
        ],
      },
    ],
  },
  {
    // The follow-along has its own full-width frame; socket.io-client loads only with it.
    path: '/live/:sessionId',
    handle: firstHtml(),
    errorElement: <RouteError />,
    hydrateFallbackElement: <LoadingBlock label="Setting out the pots…" />,
    lazy: () => import('./routes/live-follow.tsx'),
  },
];
