import { createAdapter } from '@socket.io/redis-adapter';
import { Redis } from 'ioredis';
import type { Logger } from '../logger.ts';
import type { RealtimeServer } from './socket-server.ts';

export interface RedisAdapterHandle {
  close(): Promise<void>;
}

/**
 * Lets several server processes share rooms through Redis pub/sub: an event one process emits
 * to a room reaches that room's sockets on every process, and fetchSockets asks all of them.
 * The session state itself stays in PostgreSQL, so no process holds anything the others need.
 */
export async function attachRedisAdapter(
  io: RealtimeServer,
  url: string,
  logger: Logger,
): Promise<RedisAdapterHandle> {
  // lazyConnect: a wrong URL fails the start with a clear error instead of retrying forever.
  const pub = new Redis(url, { lazyConnect: true, maxRetriesPerRequest: 3 });
  const sub = pub.duplicate();
  for (const [name, client] of [
    ['publish', pub],
    ['subscribe', sub],
  ] as const) {
    client.on('error', (error: Error) => logger.warn({ err: error }, `Redis ${name} connection`));
  }
  try {
    await Promise.all([pub.connect(), sub.connect()]);
  } catch (error) {
    pub.disconnect();
    sub.disconnect();
    throw new Error(`Redis at ${url} did not answer: ${(error as Error).message}`, {
      cause: error,
    });
  }
  // A broadcast that races shutdown (a delayed viewer update, a settling count) must not become
  // an unhandled rejection once the connection is closed: log it and drop it.
  const publish = pub.publish.bind(pub);
  pub.publish = ((channel: string, message: string | Buffer) =>
    publish(channel, message).catch((error: Error) => {
      logger.warn({ err: error }, 'Redis publish dropped');
      return 0;
    })) as typeof pub.publish;
  // Viewer counts ask every process; a process gone quiet should not hold the host's count long.
  io.adapter(createAdapter(pub, sub, { requestsTimeout: 2_000 }));
  return {
    async close() {
      await Promise.allSettled([pub.quit(), sub.quit()]);
    },
  };
}
