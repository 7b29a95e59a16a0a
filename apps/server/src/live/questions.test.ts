import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { questionQueueSchema, type Question } from '@vatside/contracts/questions';
import type { RealtimeError } from '@vatside/contracts/realtime';
import type { RunningServer } from '../server.ts';
import { signUpVerified, type TestClient, type TestPerson } from '../test-support/client.ts';
import { makeLiveSessions, type TestLive } from '../test-support/live-fixtures.ts';
import { collect, nextEvent, openSocket, type LiveSocket } from '../test-support/live-sockets.ts';
import { castStudio, type Cast } from '../test-support/personas.ts';
import { startTestServer } from '../test-support/test-server.ts';

function asked(reply: { question: Question } | RealtimeError): Question {
  if ('error' in reply) throw new Error(`${reply.error.code}: ${reply.error.message}`);
  return reply.question;
}

const pause = (ms: number) => new Promise((r) => setTimeout(r, ms));

describe('live questions (real server, real database)', () => {
  let server: RunningServer;
  let cast: Cast;
  let live: TestLive;
  let wren: TestPerson;
  const sockets: Record<'viewer' | 'wren' | 'visitor' | 'moderator' | 'host', LiveSocket> =
    {} as never;

  const queue = async (who: TestClient, sort: 'time' | 'meToo' = 'time') => {
    const res = await who.request(
      'GET',
      `/api/live-sessions/${live.liveSessionId}/questions?sort=${sort}`,
    );
    expect(res.status).toBe(200);
    return questionQueueSchema.parse(await res.json());
  };
  const ask = (socket: LiveSocket, text: string) =>
    socket.timeout(5000).emitWithAck('questions:ask', { sessionId: live.liveSessionId, text });
  const ids = (questionId: string) => ({ sessionId: live.liveSessionId, questionId });

  beforeAll(async () => {
    // One second between questions and three per session, so the limits show in a short test.
    server = await startTestServer({ QUESTION_MIN_INTERVAL_S: '1', QUESTIONS_PER_SESSION: '3' });
    cast = await castStudio(server, 'questions');
    wren = await signUpVerified(server, 'questions-wren', 'Wren Watcher');
    live = await makeLiveSessions(cast.clients.host, cast.slug);
    const people = {
      viewer: cast.clients.viewer,
      wren: wren.client,
      visitor: undefined,
      moderator: cast.clients.moderator,
      host: cast.clients.host,
    };
    for (const [name, client] of Object.entries(people)) {
      const socket = await openSocket(server.url, client);
      const joined = await socket
        .timeout(5000)
        .emitWithAck('questions:join', { sessionId: live.liveSessionId });
      expect(joined).toMatchObject({ sessionId: live.liveSessionId });
      sockets[name as keyof typeof sockets] = socket;
    }
  });
  afterAll(async () => {
    Object.values(sockets).forEach((s) => s.disconnect());
    await server.close();
  });

  it('takes a signed-in viewer’s question and shows it to the staff and other viewers, without an e-mail', async () => {
    const staffSees = nextEvent(sockets.moderator, 'questions:changed');
    const wrenSees = nextEvent(sockets.wren, 'questions:changed');
    const visitorSaw = collect(sockets.visitor, 'questions:changed');
    const question = asked(await ask(sockets.viewer, '  How long should the yarn soak?  '));
    expect(question).toMatchObject({
      text: 'How long should the yarn soak?',
      askerName: 'Vale Viewer',
      meTooCount: 0,
      answeredAt: null,
    });
    expect((await staffSees).id).toBe(question.id);
    expect((await wrenSees).id).toBe(question.id);
    // Visitors see only answered questions.
    await pause(200);
    expect(visitorSaw).toEqual([]);
    const staffQueue = await queue(cast.clients.host);
    expect(staffQueue.questions.map((q) => q.id)).toContain(question.id);
    expect(JSON.stringify(staffQueue)).not.toContain(cast.people.viewer.email);
    expect((await queue(cast.clients.visitor)).questions).toEqual([]);
    const mine = await queue(cast.clients.viewer);
    expect(mine).toMatchObject({ view: 'viewer', mine: [question.id], limits: { asked: 1 } });
  });

  it('refuses empty, overlong and visitors’ questions', async () => {
    expect(await ask(sockets.wren, '   ')).toMatchObject({ error: { code: 'VALIDATION_FAILED' } });
    expect(await ask(sockets.wren, 'x'.repeat(281))).toMatchObject({
      error: { code: 'VALIDATION_FAILED' },
    });
    expect(await ask(sockets.visitor, 'Can I ask?')).toMatchObject({
      error: { code: 'UNAUTHENTICATED' },
    });
  });

  it('limits how often and how many times one person asks', async () => {
    const first = asked(await ask(sockets.wren, 'Does citric acid work instead of vinegar?'));
    const tooSoon = await ask(sockets.wren, 'And how much of it?');
    expect(tooSoon).toMatchObject({ error: { code: 'RATE_LIMITED' } });
    expect('error' in tooSoon && tooSoon.error.message).toMatch(/ask again in 1 s/);
    await pause(1_100);
    asked(await ask(sockets.wren, 'And how much of it?'));
    await pause(1_100);
    asked(await ask(sockets.wren, 'Can the bath be reused?'));
    await pause(1_100);
    const tooMany = await ask(sockets.wren, 'One more?');
    expect(tooMany).toMatchObject({ error: { code: 'RATE_LIMITED' } });
    expect('error' in tooMany && tooMany.error.message).toMatch(/3 questions in this session/);
    expect((await queue(wren.client)).limits).toMatchObject({ asked: 3, perSession: 3 });
    expect(first.askerName).toBe('Wren Watcher');
  });

  it('counts "me too" once per person, never on one’s own question, and sorts by it', async () => {
    const byTime = (await queue(cast.clients.host)).questions;
    const soak = byTime[0]!;
    const acid = byTime[1]!;
    const hostSees = nextEvent(sockets.host, 'questions:changed', (q) => q.id === acid.id);
    expect(
      asked(await sockets.viewer.timeout(5000).emitWithAck('questions:meToo', ids(acid.id))),
    ).toMatchObject({ meTooCount: 1 });
    expect((await hostSees).meTooCount).toBe(1);
    expect(
      await sockets.viewer.timeout(5000).emitWithAck('questions:meToo', ids(acid.id)),
    ).toMatchObject({ error: { code: 'CONFLICT' } });
    expect(
      await sockets.wren.timeout(5000).emitWithAck('questions:meToo', ids(acid.id)),
    ).toMatchObject({ error: { code: 'CONFLICT', message: 'That is your own question.' } });
    asked(await sockets.moderator.timeout(5000).emitWithAck('questions:meToo', ids(acid.id)));
    expect(
      await sockets.visitor.timeout(5000).emitWithAck('questions:meToo', ids(soak.id)),
    ).toMatchObject({ error: { code: 'UNAUTHENTICATED' } });
    const byMeToo = (await queue(cast.clients.host, 'meToo')).questions;
    expect(byMeToo[0]).toMatchObject({ id: acid.id, meTooCount: 2 });
    expect(byMeToo.map((q) => q.id)).not.toEqual(byTime.map((q) => q.id));
    expect((await queue(cast.clients.viewer)).meToos).toEqual([acid.id]);
  });

  it('shows a moderator’s answer to every viewer, visitors included', async () => {
    const [soak] = (await queue(cast.clients.host)).questions;
    const viewerSees = nextEvent(sockets.viewer, 'questions:changed', (q) => q.id === soak!.id);
    const wrenSees = nextEvent(sockets.wren, 'questions:changed', (q) => q.id === soak!.id);
    const visitorSees = nextEvent(sockets.visitor, 'questions:changed', (q) => q.id === soak!.id);
    const answered = asked(
      await sockets.moderator.timeout(5000).emitWithAck('questions:answer', {
        ...ids(soak!.id),
        answer: 'At least 30 minutes in lukewarm water.',
      }),
    );
    expect(answered.answeredAt).not.toBeNull();
    for (const seen of [viewerSees, wrenSees, visitorSees]) {
      expect(await seen).toMatchObject({ answer: 'At least 30 minutes in lukewarm water.' });
    }
    const publicQueue = await queue(cast.clients.visitor);
    expect(publicQueue.questions.map((q) => q.id)).toEqual([soak!.id]);
    expect(
      await sockets.viewer.timeout(5000).emitWithAck('questions:answer', {
        ...ids(soak!.id),
        answer: 'Me, answering myself',
      }),
    ).toMatchObject({ error: { code: 'FORBIDDEN' } });
  });

  it('hides a question from viewers while the staff still see it', async () => {
    const questions = (await queue(cast.clients.host)).questions;
    const target = questions.find((q) => q.text === 'Can the bath be reused?')!;
    const removed = nextEvent(sockets.viewer, 'questions:removed');
    const staffSees = nextEvent(sockets.host, 'questions:changed', (q) => q.id === target.id);
    asked(
      await sockets.host
        .timeout(5000)
        .emitWithAck('questions:hide', { ...ids(target.id), hidden: true }),
    );
    expect(await removed).toEqual({ sessionId: live.liveSessionId, questionId: target.id });
    expect((await staffSees).hidden).toBe(true);
    expect((await queue(cast.clients.viewer)).questions.map((q) => q.id)).not.toContain(target.id);
    expect(
      (await queue(cast.clients.moderator)).questions.find((q) => q.id === target.id),
    ).toMatchObject({ hidden: true });
    // Nobody can add to a hidden question.
    expect(
      await sockets.viewer.timeout(5000).emitWithAck('questions:meToo', ids(target.id)),
    ).toMatchObject({ error: { code: 'NOT_FOUND' } });
  });

  it('mutes a viewer for the session: further questions refused kindly, staff see it', async () => {
    const [soak] = (await queue(cast.clients.host)).questions;
    const muted = asked(
      await sockets.moderator
        .timeout(5000)
        .emitWithAck('questions:mute', { ...ids(soak!.id), muted: true }),
    );
    expect(muted.askerMuted).toBe(true);
    const refused = await ask(sockets.viewer, 'Why can I not ask?');
    expect(refused).toMatchObject({ error: { code: 'FORBIDDEN' } });
    expect('error' in refused && refused.error.message).toMatch(/paused for this session/);
    expect((await queue(cast.clients.viewer)).muted).toBe(true);
    // Other viewers never learn who is muted.
    const wrenView = (await queue(wren.client)).questions.find((q) => q.id === soak!.id);
    expect(wrenView?.askerMuted).toBe(false);
    asked(
      await sockets.host
        .timeout(5000)
        .emitWithAck('questions:mute', { ...ids(soak!.id), muted: false }),
    );
    asked(await ask(sockets.viewer, 'Thanks! Is the rinse water cool or warm?'));
  });
});
