import WebSocket from 'ws';

// One viewer's phone for the benchmark: the Socket.IO protocol (Engine.IO v4 over a websocket)
// spoken directly, so thousands fit in one load generator. socket.io-client keeps a manager,
// a parser and timers per connection, and that cost, not the server's, would show in the figures.
// Frames: "0" open, "2"/"3" ping/pong, "40" connect, "42[…]" event, "42<id>[…]" emit, "43<id>[…]" ack.

export interface PhoneOptions {
  url: string;
  cookie?: string;
  /** Called with the revision of every `live:state` that arrives, and when it arrived. */
  onState?: (revision: number, atMs: number) => void;
}

const revisionPattern = /"revision":(\d+)/;

export class Phone {
  private ws: WebSocket | null = null;
  private nextAckId = 0;
  private acks = new Map<number, (reply: unknown) => void>();

  constructor(private readonly options: PhoneOptions) {}

  /** Opens the connection and the default namespace; resolves once the server accepted both. */
  connect(timeoutMs = 30_000): Promise<void> {
    const target = new URL('/socket.io/?EIO=4&transport=websocket', this.options.url);
    target.protocol = 'ws:';
    const ws = new WebSocket(target, {
      headers: this.options.cookie ? { cookie: this.options.cookie } : {},
      perMessageDeflate: false,
    });
    this.ws = ws;
    return new Promise((resolve, reject) => {
      const timer = setTimeout(() => {
        ws.terminate();
        reject(new Error('connect timed out'));
      }, timeoutMs);
      const fail = (error: Error) => {
        clearTimeout(timer);
        reject(error);
      };
      ws.once('error', fail);
      ws.on('message', (data) => {
        const text = data.toString();
        if (text.startsWith('0')) ws.send('40');
        else if (text === '2') ws.send('3');
        else if (text.startsWith('40')) {
          clearTimeout(timer);
          ws.off('error', fail);
          ws.on('error', () => undefined); // a drop shows up as a failed join later
          resolve();
        } else if (text.startsWith('42["live:state"')) {
          const revision = Number(text.match(revisionPattern)?.[1]);
          this.options.onState?.(revision, performance.now());
        } else if (text.startsWith('43')) {
          const bracket = text.indexOf('[');
          const id = Number(text.slice(2, bracket));
          const [reply] = JSON.parse(text.slice(bracket)) as unknown[];
          this.acks.get(id)?.(reply);
          this.acks.delete(id);
        } else if (text.startsWith('44')) fail(new Error(`connect refused: ${text}`));
      });
    });
  }

  /** Emits an event and waits for its acknowledgement. */
  emitWithAck<T>(event: string, payload: unknown, timeoutMs = 30_000): Promise<T> {
    const id = this.nextAckId++;
    return new Promise((resolve, reject) => {
      const timer = setTimeout(() => {
        this.acks.delete(id);
        reject(new Error(`${event} got no answer`));
      }, timeoutMs);
      this.acks.set(id, (reply) => {
        clearTimeout(timer);
        resolve(reply as T);
      });
      this.ws?.send(`42${id}${JSON.stringify([event, payload])}`);
    });
  }

  /** Closes the connection and waits until it is closed. */
  close(): Promise<void> {
    const ws = this.ws;
    this.ws = null;
    if (!ws || ws.readyState === WebSocket.CLOSED) return Promise.resolve();
    return new Promise((resolve) => {
      ws.once('close', () => resolve());
      ws.close();
    });
  }
}
