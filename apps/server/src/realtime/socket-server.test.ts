import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { io as connect, type Socket } from 'socket.io-client';
import type { ClientToServerEvents, ServerToClientEvents } from '@vatside/contracts/realtime';
import type { RunningServer } from '../server.ts';
import { startTestServer } from '../test-support/test-server.ts';

describe('Socket.IO on the same HTTP server', () => {
  let server: RunningServer;
  let socket: Socket<ServerToClientEvents, ClientToServerEvents>;

  beforeAll(async () => {
    server = await startTestServer();
    socket = connect(server.url, { transports: ['websocket'] });
    await new Promise<void>((resolve, reject) => {
      socket.once('connect', resolve);
      socket.once('connect_error', reject);
    });
  });
  afterAll(async () => {
    socket.disconnect();
    await server.close();
  });

  it('answers clock:ping with the server time', async () => {
    const before = Date.now();
    const reply = await socket.timeout(5000).emitWithAck('clock:ping', { clientSentAtMs: before });
    expect(reply).toMatchObject({ clientSentAtMs: before });
    expect('serverAtMs' in reply && reply.serverAtMs).toBeGreaterThanOrEqual(before);
  });

  it('refuses a malformed clock:ping with a validation error', async () => {
    const bad = { clientSentAtMs: 'noon' } as unknown as { clientSentAtMs: number };
    const reply = await socket.timeout(5000).emitWithAck('clock:ping', bad);
    expect(reply).toMatchObject({ error: { code: 'VALIDATION_FAILED' } });
  });
});
