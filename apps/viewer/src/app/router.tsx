import { createBrowserRouter, matchRoutes } from 'react-router-dom';
import { routes } from './routes.tsx';

/**
 * The browser's router. Taking over a first HTML from the server (`takeOver`), the matched route
 * modules load before the router starts, so its first render is the page the server wrote, not
 * a fallback. No route has a loader, so there is no router data to carry over.
 */
export async function createViewerRouter(takeOver: boolean) {
  if (takeOver) {
    const matches = matchRoutes(routes, window.location) ?? [];
    await Promise.all(
      matches.map(async ({ route }) => {
        if (typeof route.lazy !== 'function') return;
        const loaded = await route.lazy();
        Object.assign(route, { ...loaded, lazy: undefined });
      }),
    );
  }
  return createBrowserRouter(routes);
}
