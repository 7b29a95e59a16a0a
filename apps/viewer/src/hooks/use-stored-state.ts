import { useCallback, useMemo, useSyncExternalStore } from 'react';

type Parser<T> = { safeParse: (data: unknown) => { success: true; data: T } | { success: false } };

// Storage can throw (private browsing, a full quota): from then on values live in memory for
// this visit.
let inMemoryOnly = false;
const inMemory = new Map<string, string>();
const listeners = new Set<() => void>();

function subscribe(listener: () => void) {
  listeners.add(listener);
  window.addEventListener('storage', listener);
  return () => {
    listeners.delete(listener);
    window.removeEventListener('storage', listener);
  };
}

function read(key: string): string | null {
  if (!inMemoryOnly) {
    try {
      return localStorage.getItem(key);
    } catch {
      inMemoryOnly = true;
    }
  }
  return inMemory.get(key) ?? null;
}

function write(key: string, text: string | null) {
  if (!inMemoryOnly) {
    try {
      if (text === null) localStorage.removeItem(key);
      else localStorage.setItem(key, text);
      return;
    } catch {
      inMemoryOnly = true;
    }
  }
  if (text === null) inMemory.delete(key);
  else inMemory.set(key, text);
}

function parse<T>(raw: string | null, schema: Parser<T>): T | null {
  if (raw === null) return null;
  try {
    const parsed = schema.safeParse(JSON.parse(raw));
    return parsed.success ? parsed.data : null;
  } catch {
    return null;
  }
}

/**
 * A value remembered on this device (null until set, and in a page's first HTML); anything stored that no longer matches
 * `schema` counts as unset. Pass a schema defined once, outside the component.
 */
export function useStoredState<T>(key: string, schema: Parser<T>) {
  // The server's first HTML knows nothing stored on the phone: it and the render that takes it
  // over read "unset", and the stored value follows at once.
  const raw = useSyncExternalStore(
    subscribe,
    () => read(key),
    () => null,
  );
  const value = useMemo(() => parse(raw, schema), [raw, schema]);
  const setValue = useCallback(
    (next: T | null) => {
      write(key, next === null ? null : JSON.stringify(next));
      listeners.forEach((listener) => listener());
    },
    [key],
  );
  return [value, setValue] as const;
}
