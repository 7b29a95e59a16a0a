import { randomUUID } from 'node:crypto';
import type { ObjectStore } from '../storage/object-store.ts';
import type { Rendition } from './process-image.ts';

export interface RenditionKeys {
  webKey: string;
  thumbKey: string;
}

/** Random keys under the studio's prefix: nothing in a key comes from the uploader. */
export function newRenditionKeys(studioId: string): RenditionKeys {
  const prefix = `studios/${studioId}/images/${randomUUID()}`;
  return { webKey: `${prefix}/web.jpg`, thumbKey: `${prefix}/thumb.jpg` };
}

/**
 * Puts objects side by side and waits for every put to settle; throws the first failure. Waiting
 * for all before throwing matters: a caller that deletes on failure must not race a put that is
 * still writing.
 */
export async function putAll(
  store: ObjectStore,
  objects: { key: string; rendition: Rendition }[],
): Promise<void> {
  const settled = await Promise.allSettled(
    objects.map(({ key, rendition }) => store.put(key, rendition.data, rendition.contentType)),
  );
  const failed = settled.find((s) => s.status === 'rejected');
  if (failed) throw failed.reason;
}

/**
 * Puts both renditions at once, then records them with `insertRow`. If a put or the insert fails,
 * both keys are deleted again (a failed put may still have written), so no orphan object is left.
 */
export async function storeRenditions<T>(
  store: ObjectStore,
  keys: RenditionKeys,
  renditions: { web: Rendition; thumb: Rendition },
  insertRow: () => Promise<T>,
): Promise<T> {
  try {
    await putAll(store, [
      { key: keys.webKey, rendition: renditions.web },
      { key: keys.thumbKey, rendition: renditions.thumb },
    ]);
    return await insertRow();
  } catch (error) {
    await Promise.allSettled([store.delete(keys.webKey), store.delete(keys.thumbKey)]);
    throw error;
  }
}
