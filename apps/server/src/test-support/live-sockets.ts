import { io as connect, type Socket } from 'socket.io-client';
import type { ClientToServerEvents, ServerToClientEvents } from '@vatside/contracts/realtime';
import type { TestClient } from './client.ts';

export type LiveSocket = Socket<ServerToClientEvents, ClientToServerEvents>;

export function cookieOf(client: TestClient): string {
  const jar = (client as unknown as { cookies: Map<string, string> }).cookies;
  return [...jar].map(([k, v]) => `${k}=${v}`).join('; ');
}

/** A websocket to a server (by URL, so another process works too), as a person or a visitor. */
export async function openSocket(url: string, client?: TestClient): Promise<LiveSocket> {
  const socket: LiveSocket = connect(url, {
    transports: ['websocket'],
    extraHeaders: client ? { cookie: cookieOf(client) } : {},
  });
  await new Promise<void>((resolve, reject) => {
    socket.once('connect', resolve);
    socket.once('connect_error', reject);
  });
  return socket;
}

/** The next time `event` arrives with a payload `match` accepts. */
export function nextEvent<E extends keyof ServerToClientEvents>(
  socket: LiveSocket,
  event: E,
  match: (...args: Parameters<ServerToClientEvents[E]>) => boolean = () => true,
  timeoutMs = 5_000,
): Promise<Parameters<ServerToClientEvents[E]>[0]> {
  return new Promise((resolve, reject) => {
    const timer = setTimeout(() => {
      socket.off(event, listener as never);
      reject(new Error(`no ${event} within ${timeoutMs} ms`));
    }, timeoutMs);
    const listener = (...args: Parameters<ServerToClientEvents[E]>) => {
      if (!match(...args)) return;
      clearTimeout(timer);
      socket.off(event, listener as never);
      resolve(args[0]);
    };
    socket.on(event, listener as never);
  });
}

/** Everything `event` brings from now on, to check later that nothing (or something) came. */
export function collect<E extends keyof ServerToClientEvents>(socket: LiveSocket, event: E) {
  const seen: Parameters<ServerToClientEvents[E]>[0][] = [];
  socket.on(event, ((...args: Parameters<ServerToClientEvents[E]>) => seen.push(args[0])) as never);
  return seen;
}
