import { act, renderHook, waitFor } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { useWakeLock } from './use-wake-lock.ts';

/** A lock the test can release, as the browser does when the page is hidden. */
class FakeLock extends EventTarget {
  released = false;
  release = vi.fn(async () => {
    this.released = true;
    this.dispatchEvent(new Event('release'));
  });
}

let visibility: DocumentVisibilityState = 'visible';
const locks: FakeLock[] = [];
const request = vi.fn(async () => {
  const lock = new FakeLock();
  locks.push(lock);
  return lock;
});

beforeEach(() => {
  locks.length = 0;
  visibility = 'visible';
  Object.defineProperty(window, 'isSecureContext', { value: true, configurable: true });
  Object.defineProperty(navigator, 'wakeLock', { value: { request }, configurable: true });
  Object.defineProperty(document, 'visibilityState', { get: () => visibility, configurable: true });
});

afterEach(() => {
  Reflect.deleteProperty(navigator, 'wakeLock');
  Reflect.deleteProperty(window, 'isSecureContext');
  Reflect.deleteProperty(document, 'visibilityState');
  request.mockClear();
});

function setVisibility(next: DocumentVisibilityState) {
  visibility = next;
  document.dispatchEvent(new Event('visibilitychange'));
}

describe('useWakeLock', () => {
  it('keeps the screen on, and takes the lock again when the page comes back', async () => {
    const { result, unmount } = renderHook(() => useWakeLock(true));
    await waitFor(() => expect(result.current).toBe('on'));
    expect(request).toHaveBeenCalledWith('screen');

    // Hidden: the browser lets go of the lock.
    await act(async () => {
      setVisibility('hidden');
      await locks[0]?.release();
    });
    expect(result.current).toBe('off');

    act(() => setVisibility('visible'));
    await waitFor(() => expect(result.current).toBe('on'));
    expect(request).toHaveBeenCalledTimes(2);

    unmount();
    expect(locks[1]?.release).toHaveBeenCalled();
  });

  it('says the screen may dim where the API is missing', () => {
    Reflect.deleteProperty(navigator, 'wakeLock');
    const { result } = renderHook(() => useWakeLock(true));
    expect(result.current).toBe('unsupported');
    expect(request).not.toHaveBeenCalled();
  });
});
