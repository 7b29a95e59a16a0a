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
              { path: 'shelf', lazy: () => import('./routes/studio-shelf.tsx') },
              { path: 'bases', lazy: () => import('./routes/studio-bases.tsx') },
              { path: 'colorways', lazy: () => import('./routes/studio-colorways.tsx') },
              { path: 'colorways/:colorwayId', lazy: () => import('./routes/studio-colorway.tsx') },
              { path: 'calculators', lazy: () => import('./routes/studio-calculators.tsx') },
              { path: 'inspiration', lazy: () => import('./routes/studio-inspiration.tsx') },
              { path: 'live', lazy: () => import('./routes/studio-stovetop.tsx') },
              { path: 'dye-alongs', lazy: () => import('./routes/studio-dye-alongs.tsx') },
              { path: 'dye-alongs/new', lazy: () => import('./routes/studio-dye-along-new.tsx') },
              {
                path: 'dye-alongs/:dyeAlongId',
                lazy: () => import('./routes/studio-dye-along.tsx'),
              },
              {
                path: 'dye-alongs/:dyeAlongId/recap',
                lazy: () => import('./routes/studio-recap.tsx'),
              },
              {
                path: 'dye-alongs/:dyeAlongId/bath-records',
                lazy: () => import('./routes/dye-along-bath-records.tsx'),
              },
              { path: 'archive', lazy: () => import('./routes/studio-archive.tsx') },
              {
                path: 'archive/:archivedColorwayId',
                lazy: () => import('./routes/studio-archived-colorway.tsx'),
              },
              { path: 'review', lazy: () => import('./routes/studio-review.tsx') },
              { path: 'review/audit', lazy: () => import('./routes/studio-review-audit.tsx') },
            ],
          },
          { path: 'join/:token', lazy: () => import('./routes/join.tsx') },
          { path: '*', lazy: () => import('./routes/not-found.tsx') },
        ],
      },
    ],
  },
  {
    // A sheet to print: no console shell around it, only its own toolbar.
    path: '/studios/:slug/dye-alongs/:dyeAlongId/recipe-card/:colorwayId',
    errorElement: <RouteError />,
    hydrateFallbackElement: <LoadingBlock label="Opening the recipe card…" />,
    lazy: () => import('./routes/dye-along-recipe-card.tsx'),
  },
  {
    // Dye again: a sheet to print, like the recipe card.
    path: '/studios/:slug/archive/:archivedColorwayId/batch-sheet',
    errorElement: <RouteError />,
    hydrateFallbackElement: <LoadingBlock label="Opening the batch sheet…" />,
    lazy: () => import('./routes/archive-batch-sheet.tsx'),
  },
  {
    // The pot board runs full width, without the console's header: the pots need the room.
    path: '/studios/:slug/live/:sessionId',
    errorElement: <RouteError />,
    hydrateFallbackElement: <LoadingBlock label="Setting out the pots…" />,
    lazy: () => import('./routes/live-board.tsx'),
  },
  {
    // The recap presenter fills the screen for recording, like the pot board.
    path: '/studios/:slug/dye-alongs/:dyeAlongId/presenter',
    errorElement: <RouteError />,
    hydrateFallbackElement: <LoadingBlock label="Setting out the recap…" />,
    lazy: () => import('./routes/recap-presenter.tsx'),
  },
  {
    path: '/studios/:slug/dye-alongs/:dyeAlongId/presenter/notes',
    errorElement: <RouteError />,
    hydrateFallbackElement: <LoadingBlock label="Opening the notes…" />,
    lazy: () => import('./routes/recap-presenter-notes.tsx'),
  },
  {
    // Moderators answer questions here without the pot board.
    path: '/studios/:slug/live/:sessionId/questions',
    errorElement: <RouteError />,
    hydrateFallbackElement: <LoadingBlock label="Opening the questions…" />,
    lazy: () => import('./routes/live-questions.tsx'),
  },
];
