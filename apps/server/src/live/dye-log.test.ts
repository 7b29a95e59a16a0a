import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  dyeAlongDyeLogSchema,
  sessionDyeLogSchema,
  type DyeLogChange,
} from '@vatside/contracts/dye-log';
import type { RealtimeError } from '@vatside/contracts/realtime';
import { stockSolutionDetailSchema } from '@vatside/contracts/workbench-shelf';
import { dyeLogEntries } from '@vatside/db/schema';
import { eq } from '@vatside/db/sql';
import type { RunningServer } from '../server.ts';
import { makeLiveSessions, type TestLive } from '../test-support/live-fixtures.ts';
import { nextEvent, openSocket, type LiveSocket } from '../test-support/live-sockets.ts';
import { castStudio, type Cast } from '../test-support/personas.ts';
import { startTestServer } from '../test-support/test-server.ts';

// The fixture's pot: two 100 g skeins at 1 % depth of shade from a 1 % stock, so the plan is
// 2 g of dye = 200 mL of stock, from a jar of 500 mL.
const plannedMl = 200;

function changed(reply: DyeLogChange | RealtimeError): DyeLogChange {
  if ('error' in reply) throw new Error(`${reply.error.code}: ${reply.error.message}`);
  return reply;
}

describe('dye log (real server, real database)', () => {
  let server: RunningServer;
  let cast: Cast;
  let live: TestLive;
  let host: LiveSocket;
  let secondScreen: LiveSocket;

  const jarLeft = async () => {
    const res = await cast.clients.host.request(
      'GET',
      `/api/studios/${cast.slug}/stock-solutions/${live.jarId}`,
    );
    return stockSolutionDetailSchema.parse(await res.json()).volumeLeftMl;
  };
  const sessionLog = async (sessionId = live.liveSessionId, who = cast.clients.host) => {
    const res = await who.request('GET', `/api/live-sessions/${sessionId}/dye-log`);
    expect(res.status).toBe(200);
    return sessionDyeLogSchema.parse(await res.json());
  };
  const record = (payload: Record<string, unknown>, sessionId = live.liveSessionId) =>
    host.timeout(5000).emitWithAck('dyeLog:record', {
      sessionId,
      potId: live.potId,
      recipeLineId: live.recipeLineId,
      ...payload,
    });
  const correct = (entryId: string, amount: number, reason = 'Misread the syringe.') =>
    host.timeout(5000).emitWithAck('dyeLog:correct', {
      sessionId: live.liveSessionId,
      entryId,
      amount,
      reason,
    });

  beforeAll(async () => {
    server = await startTestServer();
    cast = await castStudio(server, 'dyelog');
    live = await makeLiveSessions(cast.clients.host, cast.slug);
    host = await openSocket(server.url, cast.clients.host);
    secondScreen = await openSocket(server.url, cast.clients.host);
    for (const s of [host, secondScreen]) {
      await s.timeout(5000).emitWithAck('live:join', { sessionId: live.liveSessionId });
    }
  });
  afterAll(async () => {
    host.disconnect();
    secondScreen.disconnect();
    await server.close();
  });

  it('prefills each pot line with the planned amount for the host’s skeins', async () => {
    const log = await sessionLog();
    expect(log.entries).toEqual([]);
    expect(log.pots[0]).toMatchObject({ potId: live.potId, skeinCount: 2, weightOfGoodsG: 100 });
    expect(log.pots[0]?.lines[0]).toMatchObject({
      recipeLineId: live.recipeLineId,
      kind: 'stock',
      unit: 'mL',
      plannedAmount: plannedMl,
      loggedAmount: 0,
      differencePct: null,
      jarVolumeLeftMl: 500,
    });
  });

  it('logs "as planned" with one tap, draws the jar down in the same step, and tells every host screen', async () => {
    const seen = nextEvent(secondScreen, 'dyeLog:changed');
    const { entry, line } = changed(await record({}));
    expect(entry).toMatchObject({ amount: plannedMl, asPlanned: true, jarChangeMl: -plannedMl });
    expect(entry.recordedByName).toBe('Harbor Host');
    expect(line).toMatchObject({ loggedAmount: plannedMl, jarVolumeLeftMl: 300 });
    expect((await seen).entry.id).toBe(entry.id);
    expect(await jarLeft()).toBe(300);
  });

  it('logs an adjusted amount and keeps the history when it is corrected', async () => {
    const adjusted = changed(await record({ amount: 150, note: 'Bath looked pale; held back.' }));
    expect(adjusted.entry).toMatchObject({ amount: 150, asPlanned: false, plannedAmount: 200 });
    expect(await jarLeft()).toBe(150);

    const fixed = changed(await correct(adjusted.entry.id, 120));
    expect(fixed.entry).toMatchObject({
      amount: 120,
      supersedesId: adjusted.entry.id,
      reason: 'Misread the syringe.',
      jarChangeMl: 30,
      addedAt: adjusted.entry.addedAt,
    });
    expect(fixed.superseded?.supersededById).toBe(fixed.entry.id);
    expect(await jarLeft()).toBe(180);

    // The first version stays, marked as replaced; only the latest one counts.
    const log = await sessionLog();
    expect(log.entries.map((e) => [e.amount, e.supersededById !== null])).toEqual([
      [200, false],
      [150, true],
      [120, false],
    ]);
    expect(log.pots[0]?.lines[0]).toMatchObject({ loggedAmount: 320, differencePct: 60 });

    const again = await correct(adjusted.entry.id, 100);
    expect(again).toMatchObject({ error: { code: 'CONFLICT' } });
    expect(await jarLeft()).toBe(180);
  });

  it('voids an entry by correcting it to zero, putting its stock back', async () => {
    const extra = changed(await record({ amount: 30 }));
    expect(await jarLeft()).toBe(150);
    const voided = changed(await correct(extra.entry.id, 0, 'Logged on the wrong pot.'));
    expect(voided.entry).toMatchObject({ amount: 0, jarChangeMl: 30 });
    expect(await jarLeft()).toBe(180);
  });

  it('refuses to take a jar below zero, naming the jar, and changes nothing', async () => {
    const before = (await sessionLog()).entries.length;
    const refused = await record({ amount: 400 });
    expect(refused).toMatchObject({ error: { code: 'CONFLICT' } });
    expect('error' in refused && refused.error.message).toMatch(
      /Brinewell Blue 1 % jar made on 2026-11-20 has only 180 mL left/,
    );
    expect(await jarLeft()).toBe(180);
    expect((await sessionLog()).entries).toHaveLength(before);
    // A correction upward that the jar cannot cover is refused the same way.
    const [first] = (await sessionLog()).entries;
    expect(await correct(first!.id, 500)).toMatchObject({ error: { code: 'CONFLICT' } });
    expect(await jarLeft()).toBe(180);
  });

  it('refuses bad input with a clear reason', async () => {
    expect(await record({ amount: -1 })).toMatchObject({ error: { code: 'VALIDATION_FAILED' } });
    expect(await record({ amount: 0 })).toMatchObject({ error: { code: 'VALIDATION_FAILED' } });
    expect(
      await record({ recipeLineId: '00000000-0000-4000-8000-000000000000', amount: 5 }),
    ).toMatchObject({ error: { code: 'NOT_FOUND' } });
    expect(await correct(live.recipeLineId, 5)).toMatchObject({ error: { code: 'NOT_FOUND' } });
    expect(await record({ potId: 'pot-one' })).toMatchObject({
      error: { code: 'VALIDATION_FAILED' },
    });
  });

  it('moves the jar only through the log and the shelf’s manual adjustment', async () => {
    const live2 = live;
    // Driving the pots and asking questions never touch the shelf.
    await host.timeout(5000).emitWithAck('live:action', {
      sessionId: live2.liveSessionId,
      action: { type: 'step:next', potId: live2.potId },
    });
    expect(await jarLeft()).toBe(180);
    const adjusted = await cast.clients.host.request(
      'POST',
      `/api/studios/${cast.slug}/stock-solutions/${live.jarId}/adjustments`,
      { volumeLeftMl: 250, reason: 'Measured the jar after the live.' },
    );
    expect(adjusted.status).toBe(201);
    changed(await record({ amount: 50 }));
    expect(await jarLeft()).toBe(200);
    // What the log took adds up to what the entries say.
    const rows = await server.deps.database.db
      .select()
      .from(dyeLogEntries)
      .where(eq(dyeLogEntries.sessionId, live.liveSessionId));
    expect(rows.reduce((sum, r) => sum + r.jarChangeMl, 0)).toBe(-(200 + 120 + 50));
  });

  it('keeps a rehearsal’s log apart: no jar moves, and it goes with the rehearsal', async () => {
    await host.timeout(5000).emitWithAck('live:join', { sessionId: live.rehearsalId });
    const practice = changed(await record({ amount: 90 }, live.rehearsalId));
    expect(practice.entry.jarChangeMl).toBe(0);
    expect(await jarLeft()).toBe(200);
    expect((await sessionLog(live.rehearsalId)).entries).toHaveLength(1);
    // Nobody but the host sees a rehearsal's log, not even a moderator.
    const res = await cast.clients.moderator.request(
      'GET',
      `/api/live-sessions/${live.rehearsalId}/dye-log`,
    );
    expect(res.status).toBe(404);
    await host.timeout(5000).emitWithAck('live:action', {
      sessionId: live.rehearsalId,
      action: { type: 'session:end' },
    });
    const left = await server.deps.database.db
      .select()
      .from(dyeLogEntries)
      .where(eq(dyeLogEntries.sessionId, live.rehearsalId));
    expect(left).toEqual([]);
  });

  it('lays the month’s log beside the plan per colorway, for the archive', async () => {
    const res = await cast.clients.moderator.request(
      'GET',
      `/api/studios/${cast.slug}/dye-alongs/${live.dyeAlongId}/dye-log`,
    );
    expect(res.status).toBe(200);
    const month = dyeAlongDyeLogSchema.parse(await res.json());
    expect(month.sessionIds).toEqual([live.liveSessionId]);
    expect(month.colorways[0]).toMatchObject({ potId: live.potId, colorwayName: 'Pool Teal' });
    expect(month.colorways[0]?.lines[0]).toMatchObject({
      plannedAmount: 200,
      loggedAmount: 200 + 120 + 50,
      differencePct: 85,
    });
    expect(month.colorways[0]?.entries.length).toBeGreaterThanOrEqual(6);
  });

  it('closes the log for new entries once the session ends, but still takes corrections', async () => {
    const [first] = (await sessionLog()).entries;
    await host.timeout(5000).emitWithAck('live:action', {
      sessionId: live.liveSessionId,
      action: { type: 'session:end' },
    });
    expect(await record({ amount: 5 })).toMatchObject({ error: { code: 'CONFLICT' } });
    const late = changed(await correct(first!.id, 190, 'Checked the syringe marks afterwards.'));
    expect(late.entry.amount).toBe(190);
    expect(await jarLeft()).toBe(210);
  });
});
