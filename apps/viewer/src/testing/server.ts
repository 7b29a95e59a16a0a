import { http, HttpResponse } from 'msw';
import { setupServer } from 'msw/node';
import { studioList } from './fixtures.ts';

/** The happy path; a test overrides one handler with `server.use` to try a failure. */
export const server = setupServer(http.get('/api/studios', () => HttpResponse.json(studioList)));
