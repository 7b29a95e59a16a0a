import { count } from '@vatside/db/sql';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { errorBodySchema } from '@vatside/contracts/errors';
import { studios } from '@vatside/db/schema';
import type { RunningServer } from '../server.ts';
import { startTestServer } from '../test-support/test-server.ts';

describe('bad input gets the one error shape and writes nothing', () => {
  let server: RunningServer;
  const studioCount = async () =>
    (await server.deps.database.db.select({ n: count() }).from(studios))[0]?.n;

  beforeAll(async () => {
    server = await startTestServer({ JSON_BODY_LIMIT_KB: '4' });
  });
  afterAll(() => server.close());

  async function expectError(res: Response, status: number, code: string) {
    expect(res.status).toBe(status);
    expect(res.headers.get('content-type')).toMatch(/application\/json/);
    const body = errorBodySchema.parse(await res.json());
    expect(body.error.code).toBe(code);
    expect(body.error.message.length).toBeGreaterThan(5);
    return body;
  }

  it('malformed JSON → 400 BAD_JSON', async () => {
    const before = await studioCount();
    const res = await fetch(`${server.url}/api/studios`, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: '{"name": "Tide',
    });
    await expectError(res, 400, 'BAD_JSON');
    expect(await studioCount()).toBe(before);
  });

  it('a body over the limit → 413 PAYLOAD_TOO_LARGE', async () => {
    const before = await studioCount();
    const res = await fetch(`${server.url}/api/studios`, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ name: 'x'.repeat(8 * 1024) }),
    });
    await expectError(res, 413, 'PAYLOAD_TOO_LARGE');
    expect(await studioCount()).toBe(before);
  });

  it('invalid query fields → 400 VALIDATION_FAILED naming the field', async () => {
    const body = await expectError(
      await fetch(`${server.url}/api/studios?limit=lots`),
      400,
      'VALIDATION_FAILED',
    );
    expect(Object.keys(body.error.fields ?? {})).toEqual(['limit']);
  });

  it('a state-changing request from another site → 403, nothing written', async () => {
    const before = await studioCount();
    const res = await fetch(`${server.url}/api/studios`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', origin: 'http://elsewhere.example' },
      body: JSON.stringify({ name: 'Cross Site', slug: 'cross-site', accentHex: '#000000' }),
    });
    await expectError(res, 403, 'FORBIDDEN');
    expect(await studioCount()).toBe(before);
  });

  it('an unknown API route → 404 NOT_FOUND', async () => {
    await expectError(await fetch(`${server.url}/api/skeins-of-the-moon`), 404, 'NOT_FOUND');
  });

  it('a known path with an unsupported method → 404 NOT_FOUND, nothing written', async () => {
    const before = await studioCount();
    const res = await fetch(`${server.url}/api/health`, { method: 'DELETE' });
    await expectError(res, 404, 'NOT_FOUND');
    expect(await studioCount()).toBe(before);
  });
});
