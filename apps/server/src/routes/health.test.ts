import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { healthSchema } from '@vatside/contracts/health';
import type { RunningServer } from '../server.ts';
import { startTestServer } from '../test-support/test-server.ts';

describe('GET /api/health against the real services', () => {
  let server: RunningServer;
  beforeAll(async () => {
    server = await startTestServer();
  });
  afterAll(() => server.close());

  it('reports the database, the object store and the mail catcher as reachable', async () => {
    const res = await fetch(`${server.url}/api/health`);
    const health = healthSchema.parse(await res.json());
    expect(res.status).toBe(200);
    expect(health.status).toBe('ok');
    expect(health.checks.database.ok).toBe(true);
    expect(health.checks.objectStore.ok).toBe(true);
    expect(health.checks.mail.ok).toBe(true);
  });
});

describe('GET /api/health when services are down', () => {
  let server: RunningServer;
  beforeAll(async () => {
    // Port 9 (discard) is closed on loopback here, so both probes must fail.
    server = await startTestServer({
      S3_ENDPOINT: 'http://127.0.0.1:9',
      SMTP_URL: 'smtp://127.0.0.1:9',
    });
  });
  afterAll(() => server.close());

  it('names each unreachable service and answers 503', async () => {
    const res = await fetch(`${server.url}/api/health`);
    const health = healthSchema.parse(await res.json());
    expect(res.status).toBe(503);
    expect(health.status).toBe('degraded');
    expect(health.checks.database.ok).toBe(true);
    expect(health.checks.objectStore.ok).toBe(false);
    expect(health.checks.mail.ok).toBe(false);
    expect(health.checks.mail.detail).toBeTruthy();
  });
});
