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
 * Puts both renditions, then records them with `insertRow`. If a put or the insert fails, both
 * keys are deleted again (a failed put may still have written), so no orphan object is left.
 */
export async function storeRenditions<T>(
  store: ObjectStore,
  keys: RenditionKeys,
  renditions: { web: Rendition; thumb: Rendition },
  insertRow: () => Promise<T>,
): Promise<T> {
  try {
    await store.put(keys.webKey, renditions.web.data, renditions.web.contentType);
    await store.put(keys.thumbKey, renditions.thumb.data, renditions.thumb.contentType);
    return await insertRow();
  } catch (error) {
    await Promise.allSettled([store.delete(keys.webKey), store.delete(keys.thumbKey)]);
    throw error;
  }
}
