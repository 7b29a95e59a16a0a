import type { RouteObject } from 'react-router-dom';
import { Navigate } from 'react-router-dom';
import { accountRoutes } from '@vatside/ui/account/account-routes';
import { LoadingBlock } from '@vatside/ui/LoadingBlock';
import { AppShell } from './shell.tsx';
import { RouteError } from './route-error.tsx';

/** The console's route tree as data. Route modules load lazily and export `Component`. */
export const routes: RouteObject[] = [
  {
    path: '/',
    element: <AppShell />,
    errorElement: <RouteError />,
    hydrateFallbackElement: <LoadingBlock label="Opening the console…" />,
    children: [
      {
        // Keeps the shell around a failing screen.
        errorElement: <RouteError />,
        children: [
          { index: true, lazy: () => import('./routes/studio-desk.tsx') },
          ...accountRoutes,
          { path: 'studios/new', lazy: () => import('./routes/start-studio.tsx') },
          {
            // The current studio lives in the URL, so a link or a reload keeps it.
            path: 'studios/:slug',
            lazy: () => import('./routes/studio-frame.tsx'),
            children: [
              { index: true, element: <Navigate to="members" replace /> },
              { path: 'members', lazy: () => import('./routes/studio-members.tsx') },
            ],
          },
          { path: 'join/:token', lazy: () => import('./routes/join.tsx') },
          { path: '*', lazy: () => import('./routes/not-found.tsx') },
        ],
      },
    ],
  },
];
