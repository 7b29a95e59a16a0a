import { randomBytes, randomUUID } from 'node:crypto';
import { afterAll, describe, expect, it } from 'vitest';
import { loadConfig } from '../config.ts';
import { createObjectStore } from './object-store.ts';

describe('object store through @aws-sdk/client-s3 (real local S3 API)', () => {
  const store = createObjectStore(loadConfig());
  afterAll(() => store.close());

  it('puts, reads back the same bytes, signs a GET URL and deletes', async () => {
    const key = `test/${randomUUID()}.bin`;
    const bytes = new Uint8Array(randomBytes(64 * 1024));
    await store.put(key, bytes, 'application/octet-stream');

    expect(Buffer.from(await store.getBytes(key)).equals(Buffer.from(bytes))).toBe(true);

    const signed = await store.signedGetUrl(key, 60);
    expect(signed).toContain('X-Amz-Signature=');
    const viaUrl = await fetch(signed);
    expect(viaUrl.status).toBe(200);
    expect(Buffer.from(await viaUrl.arrayBuffer()).equals(Buffer.from(bytes))).toBe(true);

    await store.delete(key);
    await expect(store.getBytes(key)).rejects.toThrow();
    expect((await fetch(signed)).status).toBe(404);
  });

  it('refuses a tampered signed URL', async () => {
    const key = `test/${randomUUID()}.txt`;
    await store.put(key, new TextEncoder().encode('skein'), 'text/plain');
    const signed = new URL(await store.signedGetUrl(key, 60));
    signed.pathname = signed.pathname.replace('.txt', '.other');
    expect((await fetch(signed)).ok).toBe(false);
    await store.delete(key);
  });
});
