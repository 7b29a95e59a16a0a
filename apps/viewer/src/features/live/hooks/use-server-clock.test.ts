import { act, renderHook, waitFor } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { FakeSocket, fakeServer } from '../../../testing/fake-socket.ts';
import type { LiveSocket } from '../socket.ts';
import { useServerClock } from './use-server-clock.ts';

const serverTimeMs = Date.UTC(2025, 4, 10, 17, 0, 0);

beforeEach(() => {
  fakeServer.reset();
  vi.useFakeTimers({ toFake: ['Date'] });
});
afterEach(() => vi.useRealTimers());

function connectedSocket() {
  const socket = new FakeSocket();
  socket.connected = true;
  return socket;
}

describe('useServerClock', () => {
  it('reads the server’s time on a phone whose clock is 90 s fast', async () => {
    vi.setSystemTime(serverTimeMs + 90_000);
    fakeServer.clockAheadMs = -90_000;
    const socket = connectedSocket();
    const { result } = renderHook(() => useServerClock(socket as unknown as LiveSocket));

    await waitFor(() => expect(result.current.estimate?.samplesUsed).toBe(3));
    expect(result.current.estimate?.offsetMs).toBe(-90_000);
    expect(result.current.serverNow()).toBe(serverTimeMs);
    expect(socket.sent('clock:ping')).toHaveLength(4);
  });

  it('trusts the fastest round trips over a slow one', async () => {
    vi.setSystemTime(serverTimeMs);
    const socket = connectedSocket();
    // The first answer is held up 4 s on the way back, which alone would put the clock 2 s off.
    let first = true;
    const answer = socket.timeout(0).emitWithAck;
    socket.timeout = () => ({
      emitWithAck: async (event: string, payload: unknown) => {
        const reply = await answer(event, payload);
        if (first) vi.setSystemTime(Date.now() + 4_000);
        first = false;
        return reply;
      },
    });
    const { result } = renderHook(() =>
      useServerClock(socket as unknown as LiveSocket, { burst: 4 }),
    );

    await waitFor(() => expect(socket.sent('clock:ping')).toHaveLength(4));
    await waitFor(() => expect(result.current.estimate?.samplesUsed).toBe(3));
    expect(result.current.estimate?.offsetMs).toBe(0);
  });

  it('pings again in a burst after a reconnect', async () => {
    vi.setSystemTime(serverTimeMs);
    const socket = new FakeSocket();
    renderHook(() => useServerClock(socket as unknown as LiveSocket, { burst: 2 }));
    expect(socket.sent('clock:ping')).toHaveLength(0);

    act(() => void socket.connect());
    await waitFor(() => expect(socket.sent('clock:ping')).toHaveLength(2));
    act(() => socket.drop());
    act(() => void socket.connect());
    await waitFor(() => expect(socket.sent('clock:ping')).toHaveLength(4));
  });
});
