import '@testing-library/jest-dom/vitest';
import { cleanup } from '@testing-library/react';
import { afterAll, afterEach } from 'vitest';
import { server } from './server.ts';

// Listen before the test file imports the app: better-auth's client keeps the `fetch` it
// finds when it is created, and that must be the one msw intercepts.
server.listen({ onUnhandledRequest: 'error' });
afterEach(() => {
  cleanup();
  server.resetHandlers();
});
afterAll(() => server.close());
