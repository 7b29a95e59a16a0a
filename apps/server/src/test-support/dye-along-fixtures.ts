import { randomUUID } from 'node:crypto';
import type { DyeAlongDetail } from '@vatside/contracts/dye-alongs';
import type { Base } from '@vatside/contracts/workbench-bases';
import type { ColorwaySummary } from '@vatside/contracts/workbench-colorways';
import type { Dye, StockSolution } from '@vatside/contracts/workbench-shelf';
import { studioMembers, user } from '@vatside/db/schema';
import type { RunningServer } from '../server.ts';
import type { TestClient } from './client.ts';
import { uniqueRecipient } from './mail-catcher.ts';

// A small month for dye-along tests: one base, one acid-dye stock, one colorway with a run
// sheet, created through the real routes by the studio's host.

async function created<T>(res: Response): Promise<T> {
  if (res.status !== 201) throw new Error(`expected 201, got ${res.status}: ${await res.text()}`);
  return (await res.json()) as T;
}

export interface TestMonth {
  base: Base;
  jar: StockSolution;
  colorway: ColorwaySummary;
}

export async function makeMonth(host: TestClient, slug: string): Promise<TestMonth> {
  const at = (rest: string) => `/api/studios/${slug}${rest}`;
  const post = <T>(rest: string, body: unknown) =>
    host.request('POST', at(rest), body).then((r) => created<T>(r));
  const base = await post<Base>('/bases', {
    name: 'Shoreline Sock',
    fiberContent: [
      { fiber: 'wool', pct: 75 },
      { fiber: 'nylon', pct: 25 },
    ],
    superwash: true,
    weightClass: 1,
    skeinWeightG: 100,
    skeinLengthM: 400,
  });
  const dye = await post<Dye>('/dyes', {
    kind: 'acidDyePowder',
    name: 'Brinewell Blue',
    swatchHex: '#1f6f78',
  });
  const jar = await post<StockSolution>('/stock-solutions', {
    dyeId: dye.id,
    stockStrengthPct: 1,
    volumeMadeMl: 500,
    madeOn: '2026-11-20',
  });
  const colorway = await post<ColorwaySummary>('/colorways', {
    name: 'Pool Teal',
    technique: 'immersion',
    baseId: base.id,
    skeinCount: 2,
    recipeLines: [{ kind: 'stock', stockSolutionId: jar.id, depthOfShadePct: 1 }],
  });
  const steps = [
    { instruction: 'Presoak the yarn in lukewarm water.', timerSeconds: 1800 },
    {
      instruction: 'Heat the bath to a simmer.',
      temperatureC: 85,
      visualCue: 'Small bubbles on the bottom, steam rising, never a rolling boil.',
      caution: 'hotBath',
    },
    { instruction: 'Add the vinegar and stir.', caution: 'acid' },
    {
      instruction: 'Add the dye stock.',
      recipeLineId: colorway.recipeLines[0]!.id,
      caution: 'hotBath',
    },
  ];
  for (const step of steps) await post(`/colorways/${colorway.id}/steps`, step);
  return { base, jar, colorway };
}

export const inDays = (days: number) => new Date(Date.now() + days * 86_400_000);

export async function makeDyeAlong(
  host: TestClient,
  slug: string,
  body: Record<string, unknown>,
): Promise<DyeAlongDetail> {
  return created<DyeAlongDetail>(
    await host.request('POST', `/api/studios/${slug}/dye-alongs`, {
      title: 'Tide pool month',
      timeZone: 'America/Halifax',
      ...body,
    }),
  );
}

export interface Follower {
  userId: string;
  email: string;
  name: string;
  timeZone: string;
}

/** Followers who asked for the studio's e-mails, written straight to the tables (no sign-in). */
export async function addFollowers(
  server: RunningServer,
  studioId: string,
  people: { label: string; timeZone: string; unitSystem?: 'us' | 'metric'; grams?: number }[],
): Promise<Follower[]> {
  const rows = people.map((p) => ({
    id: `follower-${randomUUID()}`,
    name: `Follower ${p.label}`,
    email: uniqueRecipient(p.label),
    emailVerified: true,
    timeZone: p.timeZone,
    unitSystem: p.unitSystem ?? 'us',
    defaultSkeinWeightG: p.grams ?? 100,
  }));
  const { db } = server.deps.database;
  await db.insert(user).values(rows);
  await db
    .insert(studioMembers)
    .values(
      rows.map((r) => ({ studioId, userId: r.id, role: 'viewer' as const, mailOptIn: true })),
    );
  return rows.map((r) => ({ userId: r.id, email: r.email, name: r.name, timeZone: r.timeZone }));
}
