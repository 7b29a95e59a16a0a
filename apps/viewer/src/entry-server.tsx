import { AsyncLocalStorage } from 'node:async_hooks';
import { dehydrate, type FetchQueryOptions, type QueryClient } from '@tanstack/react-query';
import { StrictMode } from 'react';
import { renderToString } from 'react-dom/server';
import { createStaticHandler, createStaticRouter, StaticRouterProvider } from 'react-router-dom';
import { setApiTransport } from '@vatside/ui/api-client.ts';
import { createQueryClient } from '@vatside/ui/query-client.ts';
import { AppProviders } from './app/providers.tsx';
import { routes, type ViewerRouteHandle } from './app/routes.tsx';
import type { FirstHtmlData } from './first-html.ts';
import { FirstHtmlTimeZone, timeZoneFromCookie } from './hooks/use-device-time-zone.ts';

// A landing page's first HTML, written on the server so a phone on a slow connection sees the
// page before the app's scripts have arrived and run; the browser then takes it over (main.tsx).
// Built by `vite build --ssr` into dist-server/ and called by the server for each page request.

export interface FirstHtmlRequest {
  /** Path and query of the page asked for. */
  url: string;
  /** Sent along with each API call: the asker's cookie, and who they are to rate limits. */
  forwardHeaders: Record<string, string>;
  /** Where the API answers, seen from the server (its own loopback address). */
  apiOrigin: string;
}

export { FIRST_HTML_DATA_ID } from './first-html.ts';

export interface FirstHtml {
  status: number;
  /** The markup inside #root. */
  html: string;
  /**
   * What it was written from (FirstHtmlData), as JSON safe inside a data block
   * (`<script type="application/json">`, which the content security policy lets through).
   */
  dataJson: string;
}

const asker = new AsyncLocalStorage<FirstHtmlRequest>();

setApiTransport((path, init) => {
  const request = asker.getStore();
  if (!request) throw new Error('An API call outside a first-HTML render');
  const headers = new Headers(init.headers);
  for (const [name, value] of Object.entries(request.forwardHeaders)) headers.set(name, value);
  return fetch(new URL(path, request.apiOrigin), { ...init, headers });
});

const handler = createStaticHandler(routes);

/** Enough for a page whose queries wait on others (the dye-along page waits for "me"). */
const MAX_PASSES = 4;

/** Inside a script element: no "</script>", and no line separators either. */
const scriptJson = (value: unknown) =>
  JSON.stringify(value)
    .replace(/</g, '\\u003c')
    .replace(/\u2028/g, '\\u2028')
    .replace(/\u2029/g, '\\u2029');

/**
 * Records every enabled query a render asks for. Components read data with useQuery, which on
 * the server only builds the query; the options it passes through here carry the query function.
 */
function recordQueries(queryClient: QueryClient) {
  const wanted = new Map<string, FetchQueryOptions>();
  const defaults = queryClient.defaultQueryOptions.bind(queryClient);
  queryClient.defaultQueryOptions = ((options: Parameters<typeof defaults>[0]) => {
    const defaulted = defaults(options);
    if (defaulted.enabled !== false) {
      wanted.set(defaulted.queryHash, defaulted as unknown as FetchQueryOptions);
    }
    return defaulted;
  }) as QueryClient['defaultQueryOptions'];
  return wanted;
}

/**
 * The first HTML of `url`, or null when the browser should start the page itself: a route not
 * written on the server, a redirect, an API answer that failed, or data still arriving after
 * MAX_PASSES renders.
 */
export async function renderFirstHtml(request: FirstHtmlRequest): Promise<FirstHtml | null> {
  return asker.run(request, async () => {
    const context = await handler.query(new Request(new URL(request.url, request.apiOrigin)));
    if (context instanceof Response) return null;
    const page = (context.matches.at(-1)?.route.handle as ViewerRouteHandle | undefined)?.firstHtml;
    if (!page || context.errors) return null;

    const timeZone = timeZoneFromCookie(request.forwardHeaders.cookie) ?? 'UTC';
    const queryClient = createQueryClient();
    // A failed answer sends the page to the browser at once; the browser retries it there.
    queryClient.setDefaultOptions({
      queries: { ...queryClient.getDefaultOptions().queries, retry: false },
    });
    const wanted = recordQueries(queryClient);
    const router = createStaticRouter(handler.dataRoutes, context);
    const render = () =>
      renderToString(
        <StrictMode>
          <FirstHtmlTimeZone.Provider value={timeZone}>
            <AppProviders queryClient={queryClient}>
              <StaticRouterProvider router={router} context={context} hydrate={false} />
            </AppProviders>
          </FirstHtmlTimeZone.Provider>
        </StrictMode>,
      );

    const fetched = new Set<string>();
    let html = render();
    for (let pass = 1; ; pass++) {
      const fresh = [...wanted].filter(([hash]) => !fetched.has(hash));
      if (fresh.length === 0) break;
      if (pass > MAX_PASSES) return null;
      await Promise.all(
        fresh.map(([hash, options]) => {
          fetched.add(hash);
          return queryClient.prefetchQuery(options);
        }),
      );
      html = render();
    }
    const failed = [...wanted.keys()].some(
      (hash) => queryClient.getQueryCache().get(hash)?.state.status !== 'success',
    );
    if (failed) return null;
    return {
      status: page.status,
      html,
      dataJson: scriptJson({ queries: dehydrate(queryClient), timeZone } satisfies FirstHtmlData),
    };
  });
}
