import { loadConfig, type Config } from '../config.ts';
import { startServer, type RunningServer } from '../server.ts';

/** A real server on a free port, wired to the test profile's real services. */
export function startTestServer(
  overrides: Partial<Record<keyof Config, string>> = {},
): Promise<RunningServer> {
  if (!process.env.DATABASE_URL?.includes('vatside_test')) {
    throw new Error('Integration tests run through `npm test`, which starts the test services.');
  }
  return startServer(
    loadConfig({
      ...process.env,
      NODE_ENV: 'test',
      PORT: '0',
      LOG_LEVEL: 'silent',
      // Tests sign many people up from one address; the limiter has its own test.
      AUTH_ATTEMPTS_PER_MINUTE: '1000',
      // Test viewers share many skeins; the share limits have their own test.
      SHARES_PER_HOUR: '1000',
      APPS_DIR: '',
      // Tests that need the mail job turn it on, so other tests' servers never send their mails.
      MAIL_WORKER_ENABLED: 'false',
      MAIL_WORKER_POLL_MS: '50',
      ...overrides,
    }),
  );
}
