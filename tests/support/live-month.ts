import type { ApiPerson } from './api.ts';
import { created } from './api.ts';

// An announced month with two colorways and their run sheets, set up through the real API by
// the studio's host (the bodies follow apps/server/src/test-support/dye-along-fixtures.ts).

export interface LiveMonth {
  dyeAlongId: string;
  title: string;
}

export async function makeLiveMonth(host: ApiPerson, slug: string): Promise<LiveMonth> {
  const post = <T>(rest: string, body: unknown) =>
    host.call('POST', `/api/studios/${slug}${rest}`, body).then((r) => created<T>(r));
  const base = await post<{ id: string }>('/bases', {
    name: 'Tidewrack Sock',
    fiberContent: [
      { fiber: 'wool', pct: 75 },
      { fiber: 'nylon', pct: 25 },
    ],
    superwash: true,
    weightClass: 1,
    skeinWeightG: 100,
    skeinLengthM: 400,
  });
  const dye = await post<{ id: string }>('/dyes', {
    kind: 'acidDyePowder',
    name: 'Brinewell Blue',
    swatchHex: '#1f6f78',
  });
  const jar = await post<{ id: string }>('/stock-solutions', {
    dyeId: dye.id,
    stockStrengthPct: 1,
    volumeMadeMl: 500,
    madeOn: '2026-11-20',
  });
  const teal = await post<{ id: string; recipeLines: { id: string }[] }>('/colorways', {
    name: 'Pool Teal',
    technique: 'immersion',
    baseId: base.id,
    recipeLines: [{ kind: 'stock', stockSolutionId: jar.id, depthOfShadePct: 1 }],
  });
  const kelp = await post<{ id: string; recipeLines: { id: string }[] }>('/colorways', {
    name: 'Kelp Shade',
    technique: 'immersion',
    baseId: base.id,
    recipeLines: [{ kind: 'foodColor', colorName: 'Moss gel', amountPer100g: 2, unit: 'gGel' }],
  });
  const steps = {
    [teal.id]: [
      { instruction: 'Presoak the yarn in lukewarm water.', timerSeconds: 1800 },
      {
        instruction: 'Heat the bath to a simmer.',
        timerSeconds: 600,
        temperatureC: 85,
        visualCue: 'Small bubbles on the bottom, steam rising, never a rolling boil.',
        caution: 'hotBath',
      },
      {
        instruction: 'Add the dye stock.',
        recipeLineId: teal.recipeLines[0]!.id,
        timerSeconds: 1200,
        caution: 'hotBath',
      },
    ],
    [kelp.id]: [
      { instruction: 'Add the vinegar and stir.', caution: 'acid' },
      {
        instruction: 'Stir in the moss gel.',
        recipeLineId: kelp.recipeLines[0]!.id,
        timerSeconds: 900,
        caution: 'hotBath',
      },
    ],
  };
  for (const [colorwayId, list] of Object.entries(steps)) {
    for (const step of list) await post(`/colorways/${colorwayId}/steps`, step);
  }
  const title = 'Tide pool month';
  const dyeAlong = await post<{ id: string }>('/dye-alongs', {
    title,
    timeZone: 'America/Halifax',
    startsAt: new Date(Date.now() + 30 * 60_000).toISOString(),
    expectedLengthMin: 90,
    colorwayIds: [teal.id, kelp.id],
  });
  const announced = await host.call(
    'POST',
    `/api/studios/${slug}/dye-alongs/${dyeAlong.id}/transitions`,
    {
      to: 'announced',
    },
  );
  if (announced.status !== 200) throw new Error(`announce failed: ${await announced.text()}`);
  return { dyeAlongId: dyeAlong.id, title };
}
