import { io as connect, type Socket } from 'socket.io-client';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { LiveState } from '@vatside/contracts/live';
import { liveProgramSchema, type LiveJoined } from '@vatside/contracts/live-program';
import type { ClientToServerEvents, ServerToClientEvents } from '@vatside/contracts/realtime';
import { liveSessions, dyeAlongs } from '@vatside/db/schema';
import { eq } from '@vatside/db/sql';
import type { RunningServer } from '../server.ts';
import type { TestClient } from '../test-support/client.ts';
import { makeLiveSessions, type TestLive } from '../test-support/live-fixtures.ts';
import { castStudio, type Cast } from '../test-support/personas.ts';
import { startTestServer } from '../test-support/test-server.ts';

type LiveSocket = Socket<ServerToClientEvents, ClientToServerEvents>;

function cookieOf(client: TestClient): string {
  const jar = (client as unknown as { cookies: Map<string, string> }).cookies;
  return [...jar].map(([k, v]) => `${k}=${v}`).join('; ');
}

async function open(server: RunningServer, client?: TestClient): Promise<LiveSocket> {
  const socket: LiveSocket = connect(server.url, {
    transports: ['websocket'],
    extraHeaders: client ? { cookie: cookieOf(client) } : {},
  });
  await new Promise<void>((resolve, reject) => {
    socket.once('connect', resolve);
    socket.once('connect_error', reject);
  });
  return socket;
}

async function join(socket: LiveSocket, sessionId: string): Promise<LiveJoined> {
  const reply = await socket.timeout(5000).emitWithAck('live:join', { sessionId });
  if ('error' in reply) throw new Error(reply.error.message);
  return reply;
}

async function act(
  socket: LiveSocket,
  sessionId: string,
  action: Parameters<ClientToServerEvents['live:action']>[0]['action'],
) {
  return socket.timeout(5000).emitWithAck('live:action', { sessionId, action });
}

const nextState = (socket: LiveSocket) =>
  new Promise<{ state: LiveState; atMs: number }>((resolve) =>
    socket.once('live:state', (state) => resolve({ state, atMs: Date.now() })),
  );

describe('live session over Socket.IO (real server, real database)', () => {
  let server: RunningServer;
  let cast: Cast;
  let live: TestLive;
  const sockets: LiveSocket[] = [];
  const track = (s: LiveSocket) => (sockets.push(s), s);

  beforeAll(async () => {
    server = await startTestServer();
    cast = await castStudio(server, 'live');
    live = await makeLiveSessions(cast.clients.host, cast.slug, [
      { hex: '#1f6f78', name: 'Deep pool' },
    ]);
  });
  afterAll(async () => {
    sockets.forEach((s) => s.disconnect());
    await server.close();
  });

  it('puts the dye-along live and serves its program with the run sheet to a visitor', async () => {
    const [row] = await server.deps.database.db
      .select()
      .from(dyeAlongs)
      .where(eq(dyeAlongs.id, live.dyeAlongId));
    expect(row?.status).toBe('live');
    const res = await cast.clients.visitor.request(
      'GET',
      `/api/live-sessions/${live.liveSessionId}/program`,
    );
    const program = liveProgramSchema.parse(await res.json());
    // Each pot carries its colorway's named target colors for the phones to show.
    expect(program.pots[0]?.swatches).toEqual([{ hex: '#1f6f78', name: 'Deep pool' }]);
    expect(program.pots[0]?.steps.map((s) => s.caution)).toEqual([
      'none',
      'hotBath',
      'acid',
      'hotBath',
    ]);
    const current = await (
      await cast.clients.visitor.request('GET', `/api/studios/${cast.slug}/live`)
    ).json();
    expect(current).toMatchObject({ live: { sessionId: live.liveSessionId } });
  });

  it('gives a joining viewer a snapshot and every later change; the host sees the viewer count', async () => {
    const host = track(await open(server, cast.clients.host));
    expect((await join(host, live.liveSessionId)).view).toBe('host');
    const counted = new Promise<number>((resolve) =>
      host.on('live:viewers', (info) => info.count >= 1 && resolve(info.count)),
    );
    const viewer = track(await open(server));
    const joined = await join(viewer, live.liveSessionId);
    expect(joined.view).toBe('viewer');
    expect(joined.state.pots[0]?.stepIndex).toBe(0);
    expect(await counted).toBeGreaterThanOrEqual(1);

    const seen = nextState(viewer);
    const reply = await act(host, live.liveSessionId, { type: 'step:next', potId: live.potId });
    expect('state' in reply && reply.state.pots[0]?.stepIndex).toBe(1);
    expect((await seen).state.pots[0]?.stepIndex).toBe(1);
  });

  it('takes a double tap on "next" as one step: the second, from the same screen, is refused', async () => {
    const host = track(await open(server, cast.clients.host));
    const { state } = await join(host, live.liveSessionId);
    const fromStep = state.pots[0]!.stepIndex;
    const tap = { type: 'step:next', potId: live.potId, fromStep } as const;
    const [first, second] = await Promise.all([
      act(host, live.liveSessionId, tap),
      act(host, live.liveSessionId, tap),
    ]);
    const replies = [first, second];
    expect(replies.filter((r) => 'state' in r)).toHaveLength(1);
    expect(replies.find((r) => 'error' in r)).toMatchObject({ error: { code: 'CONFLICT' } });
    const { state: after } = await join(host, live.liveSessionId);
    expect(after.pots[0]?.stepIndex).toBe(fromStep + 1);
    await act(host, live.liveSessionId, { type: 'step:previous', potId: live.potId });
  });

  it('refuses a step past the end with a plain reason, changing nothing', async () => {
    const host = track(await open(server, cast.clients.host));
    const { state } = await join(host, live.liveSessionId);
    const pot = state.pots[0];
    for (let i = pot?.stepIndex ?? 0; i < (pot?.stepCount ?? 0) - 1; i++) {
      await act(host, live.liveSessionId, { type: 'step:next', potId: live.potId });
    }
    const refused = await act(host, live.liveSessionId, { type: 'step:next', potId: live.potId });
    expect(refused).toMatchObject({
      error: { code: 'CONFLICT', message: 'This pot is on its last step.' },
    });
    const bad = await act(host, live.liveSessionId, {
      type: 'timer:extend',
      potId: live.potId,
      byMs: 42,
    } as never);
    expect(bad).toMatchObject({ error: { code: 'VALIDATION_FAILED' } });
  });

  it('applies simultaneous host actions exactly once each (revision-guarded writes)', async () => {
    const a = track(await open(server, cast.clients.host));
    const b = track(await open(server, cast.clients.host));
    const before = (await join(a, live.liveSessionId)).state;
    await join(b, live.liveSessionId);
    const replies = await Promise.all([
      ...Array.from({ length: 4 }, (_, i) =>
        act(a, live.liveSessionId, { type: 'note:push', text: `from a ${i}` }),
      ),
      ...Array.from({ length: 4 }, (_, i) =>
        act(b, live.liveSessionId, { type: 'note:push', text: `from b ${i}` }),
      ),
    ]);
    expect(replies.every((r) => 'state' in r)).toBe(true);
    const after = (await join(a, live.liveSessionId)).state;
    expect(after.revision).toBe(before.revision + 8);
    expect(
      after.notes
        .filter((n) => n.text.startsWith('from '))
        .map((n) => n.text)
        .sort(),
    ).toHaveLength(8);
  });

  it('holds viewers back by the stream delay and shifts their timers by it', async () => {
    const host = track(await open(server, cast.clients.host));
    await join(host, live.liveSessionId);
    await act(host, live.liveSessionId, { type: 'delay:set', streamDelayMs: 1_500 });
    const viewer = track(await open(server));
    await join(viewer, live.liveSessionId);

    const viewerSees = nextState(viewer);
    const hostSees = nextState(host);
    const sentAt = Date.now();
    await act(host, live.liveSessionId, { type: 'timer:extend', potId: live.potId, byMs: 60_000 });
    await act(host, live.liveSessionId, { type: 'timer:start', potId: live.potId });
    const hostState = await hostSees;
    expect(hostState.atMs - sentAt).toBeLessThan(1_000);
    const viewerState = await viewerSees;
    expect(viewerState.atMs - sentAt).toBeGreaterThanOrEqual(1_400);
    expect(viewerState.state.streamDelayMs).toBe(1_500);
    await act(host, live.liveSessionId, { type: 'delay:set', streamDelayMs: 0 });
  });

  it('a viewer who was away gets the exact current state when they join again', async () => {
    const host = track(await open(server, cast.clients.host));
    await join(host, live.liveSessionId);
    const viewer = track(await open(server));
    await join(viewer, live.liveSessionId);
    viewer.disconnect();
    const reply = await act(host, live.liveSessionId, {
      type: 'note:push',
      text: 'Acid goes in now',
    });
    const latest = 'state' in reply ? reply.state : undefined;
    const back = track(await open(server));
    const { state } = await join(back, live.liveSessionId);
    expect(state.revision).toBe(latest?.revision);
    expect(state.notes.at(-1)?.text).toBe('Acid goes in now');
  });
});

describe('restart in the middle of a session', () => {
  it('resumes the exact state: steps, notes and timers keep their absolute end times', async () => {
    const first = await startTestServer();
    const cast = await castStudio(first, 'restart');
    const live = await makeLiveSessions(cast.clients.host, cast.slug);
    const host = await open(first, cast.clients.host);
    await join(host, live.liveSessionId);
    await act(host, live.liveSessionId, { type: 'step:next', potId: live.potId });
    await act(host, live.liveSessionId, { type: 'timer:extend', potId: live.potId, byMs: 300_000 });
    const started = await act(host, live.liveSessionId, { type: 'timer:start', potId: live.potId });
    const before = 'state' in started ? started.state : undefined;
    host.disconnect();
    await first.close();

    const second = await startTestServer();
    try {
      const viewer = await open(second);
      const { state } = await join(viewer, live.liveSessionId);
      expect(state).toEqual(before);
      expect(state.pots[0]?.timer).toMatchObject({
        state: 'running',
        endsAtMs: (before?.pots[0]?.timer as { endsAtMs: number }).endsAtMs,
      });
      viewer.disconnect();
      const hostAgain = await open(second, cast.clients.host);
      await join(hostAgain, live.liveSessionId);
      const paused = await act(hostAgain, live.liveSessionId, {
        type: 'timer:pause',
        potId: live.potId,
      });
      expect('state' in paused && paused.state.pots[0]?.timer.state).toBe('paused');
      hostAgain.disconnect();
    } finally {
      await second.close();
    }
  });
});

describe('rehearsal', () => {
  let server: RunningServer;
  let cast: Cast;
  let live: TestLive;
  beforeAll(async () => {
    server = await startTestServer();
    cast = await castStudio(server, 'rehearse');
    live = await makeLiveSessions(cast.clients.host, cast.slug);
  });
  afterAll(() => server.close());

  it('is invisible to everyone but the host', async () => {
    for (const who of ['visitor', 'viewer', 'moderator', 'otherHost'] as const) {
      const res = await cast.clients[who].request(
        'GET',
        `/api/live-sessions/${live.rehearsalId}/program`,
      );
      expect(res.status, who).toBe(404);
    }
    expect(
      (await cast.clients.host.request('GET', `/api/live-sessions/${live.rehearsalId}/program`))
        .status,
    ).toBe(200);
    const current = (await (
      await cast.clients.visitor.request('GET', `/api/studios/${cast.slug}/live`)
    ).json()) as {
      live: { sessionId: string };
    };
    expect(current.live.sessionId).toBe(live.liveSessionId);
  });

  it('leaves no trace in the month when it ends', async () => {
    const host = await open(server, cast.clients.host);
    await join(host, live.rehearsalId);
    await act(host, live.rehearsalId, { type: 'note:push', text: 'Practice run' });
    const ended = await act(host, live.rehearsalId, { type: 'session:end' });
    expect('state' in ended && ended.state.status).toBe('ended');
    host.disconnect();
    const rows = await server.deps.database.db
      .select()
      .from(liveSessions)
      .where(eq(liveSessions.id, live.rehearsalId));
    expect(rows).toHaveLength(0);
  });

  it('refuses to go live for a draft, saying why', async () => {
    const res = await cast.clients.host.request('POST', `/api/studios/${cast.slug}/dye-alongs`, {
      title: 'Draft month',
      timeZone: 'America/Halifax',
      startsAt: new Date(Date.now() + 3_600_000).toISOString(),
    });
    const draft = (await res.json()) as { id: string };
    const refused = await cast.clients.host.request(
      'POST',
      `/api/studios/${cast.slug}/dye-alongs/${draft.id}/live-sessions`,
      {
        mode: 'live',
      },
    );
    expect(refused.status).toBe(409);
    expect(((await refused.json()) as { error: { message: string } }).error.message).toMatch(
      /announce it first/,
    );
  });
});
