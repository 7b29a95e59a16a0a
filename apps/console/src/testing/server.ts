import type { Me } from '@vatside/contracts/account';
import { http, HttpResponse } from 'msw';
import { setupServer } from 'msw/node';
import { healthyReport, studioList } from './fixtures.ts';
import { kelpwhistleStorage } from './storage-fixtures.ts';

// A visitor: the server answers "nobody" rather than an error.
const signedOut = () => HttpResponse.json(null);

/** The happy path for a visitor; a test overrides one handler with `server.use`. */
export const server = setupServer(
  http.get('/api/me', signedOut),
  http.get('/api/studios', () => HttpResponse.json(studioList)),
  http.get('/api/health', () => HttpResponse.json(healthyReport)),
  // The host's members page shows the storage panel.
  http.get('/api/studios/:slug/storage', () => HttpResponse.json(kelpwhistleStorage)),
  // The studio's navigation counts the skeins waiting for review: none unless a test says so.
  http.get('/api/studios/:slug/review/submissions', () =>
    HttpResponse.json({ items: [], page: { limit: 1, offset: 0, total: 0 } }),
  ),
);

/** From now on, /api/me answers as this person. */
export function signIn(me: Me) {
  server.use(http.get('/api/me', () => HttpResponse.json(me)));
}
