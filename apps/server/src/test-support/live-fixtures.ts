import type { TestClient } from './client.ts';
import { makeDyeAlong, makeMonth } from './dye-along-fixtures.ts';

export interface TestLive {
  dyeAlongId: string;
  liveSessionId: string;
  rehearsalId: string;
  potId: string;
  /** The pot's one recipe line: the 1 % stock jar (500 mL made) at 1 % depth of shade. */
  recipeLineId: string;
  jarId: string;
}

/**
 * An announced month starting in half an hour, with a running live session and a rehearsal.
 * `targetSwatches` are set on the pot's colorway before the sessions fix their program.
 */
export async function makeLiveSessions(
  host: TestClient,
  slug: string,
  targetSwatches: { hex: string; name: string }[] = [],
): Promise<TestLive> {
  const { colorway, jar } = await makeMonth(host, slug);
  if (targetSwatches.length > 0) {
    const res = await host.request('PATCH', `/api/studios/${slug}/colorways/${colorway.id}`, {
      targetSwatches,
    });
    if (res.status !== 200) throw new Error(`swatches failed: ${res.status} ${await res.text()}`);
  }
  const dyeAlong = await makeDyeAlong(host, slug, {
    startsAt: new Date(Date.now() + 30 * 60_000).toISOString(),
    expectedLengthMin: 90,
    colorwayIds: [colorway.id],
  });
  const at = `/api/studios/${slug}/dye-alongs/${dyeAlong.id}`;
  const announced = await host.request('POST', `${at}/transitions`, { to: 'announced' });
  if (announced.status !== 200)
    throw new Error(`announce failed: ${announced.status} ${await announced.text()}`);
  const start = async (mode: 'live' | 'rehearsal') => {
    const res = await host.request('POST', `${at}/live-sessions`, { mode });
    if (res.status !== 201)
      throw new Error(`${mode} start failed: ${res.status} ${await res.text()}`);
    return ((await res.json()) as { sessionId: string }).sessionId;
  };
  const rehearsalId = await start('rehearsal');
  const liveSessionId = await start('live');
  return {
    dyeAlongId: dyeAlong.id,
    liveSessionId,
    rehearsalId,
    potId: colorway.id,
    recipeLineId: colorway.recipeLines[0]!.id,
    jarId: jar.id,
  };
}
