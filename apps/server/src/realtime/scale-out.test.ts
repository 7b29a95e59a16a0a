import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { createServer } from 'node:net';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { LiveState } from '@vatside/contracts/live';
import type { RunningServer } from '../server.ts';
import { makeLiveSessions, type TestLive } from '../test-support/live-fixtures.ts';
import { collect, nextEvent, openSocket, type LiveSocket } from '../test-support/live-sockets.ts';
import { castStudio, type Cast } from '../test-support/personas.ts';
import { startTestServer } from '../test-support/test-server.ts';

// Two server processes sharing one database and one Redis: this test process (A) and a child
// process (B) started the way `npm start` starts the server. Redis is started here too.

const serverDir = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');
const hasRedis = spawnSync('redis-server', ['--version']).status === 0;
if (!hasRedis) {
  console.warn(
    '[scale-out] redis-server is not installed, so the two-process test is skipped; ' +
      'infra-local/redis.sh installs it (apt-get install redis-server).',
  );
}

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const probe = createServer();
    probe.once('error', reject);
    probe.listen(0, '127.0.0.1', () => {
      const address = probe.address();
      probe.close(() => resolve(typeof address === 'object' && address ? address.port : 0));
    });
  });
}

function waitForOutput(child: ChildProcess, pattern: RegExp, what: string, timeoutMs: number) {
  return new Promise<void>((resolve, reject) => {
    let seen = '';
    const timer = setTimeout(
      () => reject(new Error(`${what} did not start in time:\n${seen}`)),
      timeoutMs,
    );
    const look = (chunk: Buffer) => {
      seen += chunk.toString();
      if (pattern.test(seen)) {
        clearTimeout(timer);
        resolve();
      }
    };
    child.stdout?.on('data', look);
    child.stderr?.on('data', look);
    child.once('exit', (code) => {
      clearTimeout(timer);
      reject(new Error(`${what} exited (${code}):\n${seen}`));
    });
  });
}

async function stop(child: ChildProcess | undefined) {
  if (!child || child.exitCode !== null) return;
  const exited = new Promise((r) => child.once('exit', r));
  child.kill('SIGTERM');
  await exited;
}

const joinSession = async (socket: LiveSocket, sessionId: string) => {
  const reply = await socket.timeout(5000).emitWithAck('live:join', { sessionId });
  if ('error' in reply) throw new Error(reply.error.message);
  return reply.state;
};

describe.skipIf(!hasRedis)('two server processes through the Redis adapter', () => {
  let redis: ChildProcess | undefined;
  let processB: ChildProcess | undefined;
  let serverA: RunningServer;
  let urlB: string;
  let cast: Cast;
  let live: TestLive;
  const sockets: LiveSocket[] = [];
  const track = async (s: Promise<LiveSocket>) => {
    const socket = await s;
    sockets.push(socket);
    return socket;
  };

  beforeAll(async () => {
    const redisPort = await freePort();
    redis = spawn('redis-server', [
      '--port',
      String(redisPort),
      '--bind',
      '127.0.0.1',
      '--save',
      '',
      '--appendonly',
      'no',
    ]);
    await waitForOutput(redis, /Ready to accept connections/, 'Redis', 15_000);
    const REDIS_URL = `redis://127.0.0.1:${redisPort}`;

    serverA = await startTestServer({ REDIS_URL });
    const portB = await freePort();
    urlB = `http://127.0.0.1:${portB}`;
    processB = spawn(process.execPath, ['--import', 'tsx', 'src/main.ts'], {
      cwd: serverDir,
      env: {
        ...process.env,
        NODE_ENV: 'test',
        HOST: '127.0.0.1',
        PORT: String(portB),
        REDIS_URL,
        LOG_LEVEL: 'info',
        MAIL_WORKER_ENABLED: 'false',
        APPS_DIR: '',
      },
    });
    await waitForOutput(processB, /Vatside server listening/, 'Server process B', 60_000);

    cast = await castStudio(serverA, 'scaleout');
    live = await makeLiveSessions(cast.clients.host, cast.slug);
  }, 120_000);

  afterAll(async () => {
    sockets.forEach((s) => s.disconnect());
    await serverA?.close();
    await stop(processB);
    await stop(redis);
  });

  it('a host on one process and viewers on both follow the same session, counted across both', async () => {
    const host = await track(openSocket(urlB, cast.clients.host));
    await joinSession(host, live.liveSessionId);
    const counted = nextEvent(host, 'live:viewers', (info) => info.count === 5, 8_000);
    const viewersA = await Promise.all([1, 2, 3].map(() => track(openSocket(serverA.url))));
    const viewersB = await Promise.all([1, 2].map(() => track(openSocket(urlB))));
    for (const v of [...viewersA, ...viewersB]) await joinSession(v, live.liveSessionId);
    // fetchSockets asks both processes: three viewers on A and two on B.
    expect((await counted).count).toBe(5);

    const arrivals = [...viewersA, ...viewersB].map((v) => nextEvent(v, 'live:state'));
    const reply = await host.timeout(5000).emitWithAck('live:action', {
      sessionId: live.liveSessionId,
      action: { type: 'step:next', potId: live.potId },
    });
    if ('error' in reply) throw new Error(reply.error.message);
    const states = await Promise.all(arrivals);
    expect(states.map((s) => s.revision)).toEqual(states.map(() => reply.state.revision));
    expect(states.every((s) => s.pots[0]?.stepIndex === 1)).toBe(true);
  });

  it('applies actions sent through each process exactly once, and every viewer gets each', async () => {
    const hostA = await track(openSocket(serverA.url, cast.clients.host));
    const hostB = await track(openSocket(urlB, cast.clients.host));
    const before = await joinSession(hostA, live.liveSessionId);
    await joinSession(hostB, live.liveSessionId);
    const viewerA = await track(openSocket(serverA.url));
    const viewerB = await track(openSocket(urlB));
    await joinSession(viewerA, live.liveSessionId);
    await joinSession(viewerB, live.liveSessionId);
    const seenA = collect(viewerA, 'live:state');
    const seenB = collect(viewerB, 'live:state');

    const replies = await Promise.all(
      [hostA, hostB, hostA, hostB].map((h, i) =>
        h.timeout(5000).emitWithAck('live:action', {
          sessionId: live.liveSessionId,
          action: { type: 'note:push', text: `through ${i % 2 ? 'B' : 'A'} #${i}` },
        }),
      ),
    );
    expect(replies.every((r) => 'state' in r)).toBe(true);
    const after = await joinSession(viewerA, live.liveSessionId);
    expect(after.revision).toBe(before.revision + 4);
    const revisions = (seen: LiveState[]) => seen.map((s) => s.revision).sort((x, y) => x - y);
    await expect.poll(() => seenA.length).toBe(4);
    await expect.poll(() => seenB.length).toBe(4);
    const expected = [1, 2, 3, 4].map((n) => before.revision + n);
    expect(revisions(seenA)).toEqual(expected);
    expect(revisions(seenB)).toEqual(expected);
  });

  it('one tap sent to both processes lands once; the other is refused', async () => {
    const hostA = await track(openSocket(serverA.url, cast.clients.host));
    const hostB = await track(openSocket(urlB, cast.clients.host));
    const before = await joinSession(hostA, live.liveSessionId);
    await joinSession(hostB, live.liveSessionId);
    const viewer = await track(openSocket(urlB));
    await joinSession(viewer, live.liveSessionId);
    const seen = collect(viewer, 'live:state');

    const tap = {
      sessionId: live.liveSessionId,
      action: { type: 'step:next' as const, potId: live.potId },
      baseRevision: before.revision,
    };
    const replies = await Promise.all(
      [hostA, hostB].map((h) => h.timeout(5000).emitWithAck('live:action', tap)),
    );
    const applied = replies.filter((r) => 'state' in r);
    expect(applied).toHaveLength(1);
    expect(replies.find((r) => 'error' in r)).toMatchObject({ error: { code: 'CONFLICT' } });
    const after = await joinSession(hostA, live.liveSessionId);
    expect(after.revision).toBe(before.revision + 1);
    expect(after.pots[0]?.stepIndex).toBe((before.pots[0]?.stepIndex ?? 0) + 1);
    await expect.poll(() => seen.length).toBe(1);
    await new Promise((r) => setTimeout(r, 300));
    expect(seen).toHaveLength(1);
  });

  it('carries questions between processes: asked on one, seen by the staff on the other', async () => {
    const moderator = await track(openSocket(urlB, cast.clients.moderator));
    const viewer = await track(openSocket(serverA.url, cast.clients.viewer));
    for (const s of [moderator, viewer]) {
      await s.timeout(5000).emitWithAck('questions:join', { sessionId: live.liveSessionId });
    }
    const staffSees = nextEvent(moderator, 'questions:changed');
    const asked = await viewer.timeout(5000).emitWithAck('questions:ask', {
      sessionId: live.liveSessionId,
      text: 'Does the second pot need more acid?',
    });
    expect((await staffSees).text).toBe('Does the second pot need more acid?');
    expect(asked).toMatchObject({ question: { askerName: 'Vale Viewer' } });
  });
});
