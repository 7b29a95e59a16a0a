import { useEffect, useState } from 'react';

export type OfflinePhotos = {
  /** The object URL for a photo once it is held in memory, else the address itself. */
  src: (url: string) => string;
  done: number;
  total: number;
  failed: number;
  ready: boolean;
};

/**
 * Fetches every photo of the recap once, as blobs held in object URLs, so the presenter keeps
 * working if the network drops while recording. Object URLs are released on leaving.
 */
export function useOfflinePhotos(urls: string[]): OfflinePhotos {
  const key = urls.join('\n');
  const [held, setHeld] = useState<{ key: string; map: Map<string, string>; failed: number }>({
    key: '',
    map: new Map(),
    failed: 0,
  });
  useEffect(() => {
    const list = key ? key.split('\n') : [];
    const controller = new AbortController();
    const made: string[] = [];
    const map = new Map<string, string>();
    let failed = 0;
    setHeld({ key, map: new Map(), failed: 0 });
    for (const url of list) {
      fetch(url, { signal: controller.signal, credentials: 'same-origin' })
        .then((res) => {
          if (!res.ok) throw new Error(String(res.status));
          return res.blob();
        })
        .then((blob) => {
          const objectUrl = URL.createObjectURL(blob);
          made.push(objectUrl);
          map.set(url, objectUrl);
        })
        .catch(() => {
          if (!controller.signal.aborted) failed += 1;
        })
        .finally(() => {
          if (!controller.signal.aborted) setHeld({ key, map: new Map(map), failed });
        });
    }
    return () => {
      controller.abort();
      for (const objectUrl of made) URL.revokeObjectURL(objectUrl);
    };
  }, [key]);
  const total = key ? key.split('\n').length : 0;
  const current = held.key === key ? held : { map: new Map<string, string>(), failed: 0 };
  const done = current.map.size;
  return {
    src: (url) => current.map.get(url) ?? url,
    done,
    total,
    failed: current.failed,
    ready: done === total,
  };
}
