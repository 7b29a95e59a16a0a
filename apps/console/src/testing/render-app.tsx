import { QueryClient } from '@tanstack/react-query';
import { render } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { createMemoryRouter, RouterProvider } from 'react-router-dom';
import { AppProviders } from '../app/providers.tsx';
import { routes } from '../app/routes.tsx';

/**
 * Renders the real route tree at `path` (inside the console's /console base path, as served),
 * with a fresh cache and no automatic retries.
 */
export function renderApp(path = '/') {
  const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  const router = createMemoryRouter(routes, {
    basename: '/console',
    initialEntries: [`/console${path === '/' ? '' : path}`],
  });
  const user = userEvent.setup();
  render(
    <AppProviders queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProviders>,
  );
  return { user, router };
}

/** For the first find after renderApp: a lazy route chunk can take a while on a busy machine. */
export const firstRender = { timeout: 10_000 };
