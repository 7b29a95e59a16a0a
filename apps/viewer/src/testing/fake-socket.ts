import type { LiveState } from '@vatside/contracts/live';
import type { RealtimeError } from '@vatside/contracts/realtime';

type Listener = (...args: unknown[]) => void;
type Answer = (payload: unknown) => unknown;

/**
 * A pretend Socket.IO server for component tests: what `live:join` answers and how far its
 * clock is from the test's `Date.now()`.
 */
export const fakeServer = {
  state: null as LiveState | null,
  refusal: null as RealtimeError | null,
  /** Server clock = Date.now() + this. */
  clockAheadMs: 0,
  /** Answers a test adds or replaces (e.g. `questions:join`). */
  answers: {} as Record<string, Answer>,
  sockets: [] as FakeSocket[],
  reset() {
    this.answers = {};
    this.state = null;
    this.refusal = null;
    this.clockAheadMs = 0;
    this.sockets = [];
  },
  /** The socket the page opened last. */
  get socket(): FakeSocket {
    const socket = this.sockets.at(-1);
    if (!socket) throw new Error('The page has not opened a socket yet.');
    return socket;
  },
};

const serverNow = () => Date.now() + fakeServer.clockAheadMs;

const defaultAnswers: Record<string, Answer> = {
  'clock:ping': (payload) => ({
    clientSentAtMs: (payload as { clientSentAtMs: number }).clientSentAtMs,
    serverAtMs: serverNow(),
  }),
  'live:join': () =>
    fakeServer.refusal ?? { state: fakeServer.state, serverNowMs: serverNow(), view: 'viewer' },
  'live:leave': () => ({ ok: true }),
};

/** An in-memory stand-in for socket.io-client's Socket: on/off/emit/timeout().emitWithAck. */
export class FakeSocket {
  connected = false;
  readonly emitted: Array<{ event: string; payload: unknown }> = [];
  private readonly listeners = new Map<string, Set<Listener>>();

  on(event: string, listener: Listener) {
    if (!this.listeners.has(event)) this.listeners.set(event, new Set());
    this.listeners.get(event)?.add(listener);
    return this;
  }

  off(event: string, listener: Listener) {
    this.listeners.get(event)?.delete(listener);
    return this;
  }

  emit(event: string, payload: unknown, ack?: (reply: unknown) => void) {
    const reply = this.answer(event, payload);
    if (ack) void reply.then(ack);
    return this;
  }

  timeout(_ms: number) {
    return { emitWithAck: (event: string, payload: unknown) => this.answer(event, payload) };
  }

  connect() {
    this.connected = true;
    this.fire('connect');
    return this;
  }

  disconnect() {
    if (this.connected) this.drop('io client disconnect');
    return this;
  }

  /** Test side: the connection breaks. */
  drop(reason = 'transport close') {
    this.connected = false;
    this.fire('disconnect', reason);
  }

  /** Test side: the server sends an event. */
  fire(event: string, ...args: unknown[]) {
    for (const listener of [...(this.listeners.get(event) ?? [])]) listener(...args);
  }

  sent(event: string) {
    return this.emitted.filter((e) => e.event === event).map((e) => e.payload);
  }

  private answer(event: string, payload: unknown): Promise<unknown> {
    this.emitted.push({ event, payload });
    const answer = fakeServer.answers[event] ?? defaultAnswers[event];
    // Like a real ack, the answer arrives later, never within the emit.
    return answer ? Promise.resolve().then(() => answer(payload)) : new Promise(() => undefined);
  }
}

/** Replaces socket.io-client's `io` in tests: `vi.mock('socket.io-client', ...)`. */
export function fakeIo() {
  const socket = new FakeSocket();
  fakeServer.sockets.push(socket);
  return socket;
}
