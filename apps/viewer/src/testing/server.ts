import type { Me } from '@vatside/contracts/account';
import { http, HttpResponse } from 'msw';
import { setupServer } from 'msw/node';
import { studioList } from './fixtures.ts';

// A visitor: the server answers "nobody" rather than an error.
const signedOut = () => HttpResponse.json(null);

/** The happy path for a visitor; a test overrides one handler with `server.use`. */
export const server = setupServer(
  http.get('/api/me', signedOut),
  http.get('/api/studios', () => HttpResponse.json(studioList)),
  // Most days nothing is on the stove.
  http.get('/api/studios/:slug/live', () => HttpResponse.json({ live: null })),
  // …and no dye-along is announced.
  http.get('/api/studios/:slug/dye-alongs', () =>
    HttpResponse.json({ items: [], page: { limit: 5, offset: 0, total: 0 } }),
  ),
);

/** From now on, /api/me answers as this person. */
export function signIn(me: Me) {
  server.use(http.get('/api/me', () => HttpResponse.json(me)));
}
