import type { RouteObject } from 'react-router-dom';
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
          { path: '*', lazy: () => import('./routes/not-found.tsx') },
        ],
      },
    ],
  },
];
