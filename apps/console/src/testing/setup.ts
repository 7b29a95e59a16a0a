import '@testing-library/jest-dom/vitest';
import { cleanup, configure } from '@testing-library/react';
import { afterAll, afterEach } from 'vitest';
import { server } from './server.ts';

// Listen before the test file imports the app: better-auth's client keeps the `fetch` it
// finds when it is created, and that must be the one msw intercepts.
server.listen({ onUnhandledRequest: 'error' });
// Lazy route modules can take over a second to load on a busy machine.
configure({ asyncUtilTimeout: 5_000 });
afterEach(() => {
  cleanup();
  server.resetHandlers();
});
afterAll(() => server.close());
