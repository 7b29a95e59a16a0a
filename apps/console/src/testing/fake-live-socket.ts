// A stand-in for socket.io-client's Socket in component tests: it records what the app sends,
// answers acknowledgements from a table, and lets a test push server events or drop the line.

type Handler = (...args: never[]) => void;
type Answer = (payload: never) => unknown;

export class FakeLiveSocket {
  connected = false;
  readonly sent: { event: string; payload: unknown }[] = [];
  private readonly handlers = new Map<string, Set<Handler>>();

  constructor(private readonly answers: Record<string, Answer>) {}

  /** Adds or replaces how the fake server answers one event. */
  answer(event: string, answer: Answer) {
    this.answers[event] = answer;
  }

  on(event: string, handler: Handler) {
    if (!this.handlers.has(event)) this.handlers.set(event, new Set());
    this.handlers.get(event)?.add(handler);
    return this;
  }

  off(event: string, handler: Handler) {
    this.handlers.get(event)?.delete(handler);
    return this;
  }

  connect() {
    if (!this.connected) {
      this.connected = true;
      this.fire('connect');
    }
    return this;
  }

  disconnect() {
    if (this.connected) {
      this.connected = false;
      this.fire('disconnect', 'io client disconnect');
    }
    return this;
  }

  /** The line drops (the server or the network went away). */
  drop() {
    this.connected = false;
    this.fire('disconnect', 'transport close');
  }

  timeout(_ms: number) {
    return { emitWithAck: (event: string, payload: unknown) => this.emitWithAck(event, payload) };
  }

  async emitWithAck(event: string, payload: unknown): Promise<unknown> {
    this.sent.push({ event, payload });
    const answer = this.answers[event];
    if (!answer) throw new Error(`The fake server has no answer for ${event}`);
    return answer(payload as never);
  }

  emit(event: string, payload: unknown, ack?: (reply: unknown) => void) {
    void this.emitWithAck(event, payload).then(ack, () => undefined);
    return this;
  }

  /** A server → client event. */
  fire(event: string, ...args: unknown[]) {
    for (const handler of this.handlers.get(event) ?? [])
      (handler as (...a: unknown[]) => void)(...args);
  }

  /** The actions the board sent, in order. */
  actions(): unknown[] {
    return this.sent
      .filter((s) => s.event === 'live:action')
      .map((s) => (s.payload as { action: unknown }).action);
  }
}
