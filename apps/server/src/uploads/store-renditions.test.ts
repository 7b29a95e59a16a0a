import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { loadConfig, type Config } from '../config.ts';
import { createObjectStore, type ObjectStore } from '../storage/object-store.ts';
import { processImage, type Rendition } from './process-image.ts';
import { newRenditionKeys, storeRenditions } from './store-renditions.ts';
import { countObjects } from './test-bucket.ts';
import { bandedPng } from './test-images.ts';

describe('storing renditions leaves no orphan object when a later step fails', () => {
  let config: Config;
  let store: ObjectStore;
  let renditions: { web: Rendition; thumb: Rendition };

  beforeAll(async () => {
    if (!process.env.DATABASE_URL?.includes('vatside_test')) {
      throw new Error('Integration tests run through `npm test`, which starts the test services.');
    }
    config = loadConfig(process.env);
    store = createObjectStore(config);
    renditions = await processImage(await bandedPng(), { maxPixels: 1e7, swatchCount: 4 });
  });
  afterAll(() => store.close());

  it('stores both renditions under random keys in the studio prefix when the row is saved', async () => {
    const studioId = randomUUID();
    const keys = newRenditionKeys(studioId);
    expect(keys.webKey).toMatch(new RegExp(`^studios/${studioId}/images/[0-9a-f-]{36}/web\\.jpg$`));
    expect(newRenditionKeys(studioId).webKey).not.toBe(keys.webKey);
    const saved = await storeRenditions(store, keys, renditions, async () => 'row');
    expect(saved).toBe('row');
    expect(await countObjects(config, `studios/${studioId}/`)).toBe(2);
    expect(Buffer.from(await store.getBytes(keys.thumbKey)).equals(renditions.thumb.data)).toBe(
      true,
    );
    await Promise.all([store.delete(keys.webKey), store.delete(keys.thumbKey)]);
  });

  it('deletes both objects when the database insert fails', async () => {
    const studioId = randomUUID();
    const failingInsert = async () => {
      throw new Error('insert refused');
    };
    await expect(
      storeRenditions(store, newRenditionKeys(studioId), renditions, failingInsert),
    ).rejects.toThrow('insert refused');
    expect(await countObjects(config, `studios/${studioId}/`)).toBe(0);
  });

  it('deletes the first object when the second put fails', async () => {
    const studioId = randomUUID();
    let puts = 0;
    const flaky: ObjectStore = {
      ...store,
      async put(key, body, type) {
        if (++puts === 2) throw new Error('store went away');
        await store.put(key, body, type);
      },
    };
    await expect(
      storeRenditions(flaky, newRenditionKeys(studioId), renditions, async () => 'row'),
    ).rejects.toThrow('store went away');
    expect(puts).toBe(2);
    expect(await countObjects(config, `studios/${studioId}/`)).toBe(0);
  });
});
