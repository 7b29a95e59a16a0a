import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  archiveListSchema,
  archivedColorwayDetailSchema,
  bathRecordListSchema,
  bathRecordSchema,
  dyeAgainSchema,
} from '@vatside/contracts/archive';
import type { Base } from '@vatside/contracts/workbench-bases';
import type { ColorwaySummary } from '@vatside/contracts/workbench-colorways';
import type { Dye } from '@vatside/contracts/workbench-shelf';
import type { Image } from '@vatside/contracts/workbench-images';
import { deltaE2000, hexToLab } from '@vatside/dye-kit';
import sharp from 'sharp';
import type { RunningServer } from '../server.ts';
import { makeDyeAlong } from '../test-support/dye-along-fixtures.ts';
import { makeLiveSessions, type TestLive } from '../test-support/live-fixtures.ts';
import { openSocket } from '../test-support/live-sockets.ts';
import { castStudio, type Cast } from '../test-support/personas.ts';
import { startTestServer } from '../test-support/test-server.ts';

// The fixture's live pot: two 100 g skeins at 1 % depth of shade from a 1 % stock (plan 200 mL of
// a 500 mL jar). The host logs 210 mL. Formulas: dye mass = WOG × DOS ÷ 100, stock mL = WOG × DOS
// ÷ strength (common practice, packages/dye-kit/test-data/README.md).
const loggedMl = 210;
/** The finished skeins of a colorway planned without target swatches, photographed flat. */
const seaGlassHex = '#7fb8a4';

async function json<T>(res: Response, status = 200): Promise<T> {
  if (res.status !== status)
    throw new Error(`expected ${status}, got ${res.status}: ${await res.text()}`);
  return (await res.json()) as T;
}

describe('archive and dye again (real server, real database)', () => {
  let server: RunningServer;
  let cast: Cast;
  let live: TestLive;
  let secondBase: Base;
  let moss: Dye;
  const at = (rest: string) => `/api/studios/${cast.slug}${rest}`;
  const host = () => cast.clients.host;
  const move = async (dyeAlongId: string, to: string) =>
    json(await host().request('POST', at(`/dye-alongs/${dyeAlongId}/transitions`), { to }));
  const archiveThrough = async (dyeAlongId: string, from: 'live' | 'announced') => {
    for (const to of from === 'announced'
      ? ['live', 'sharing', 'recap', 'archived']
      : ['sharing', 'recap', 'archived']) {
      await move(dyeAlongId, to);
    }
  };
  const search = async (query: string) =>
    archiveListSchema.parse(await json(await host().request('GET', at(`/archive?${query}`))));

  beforeAll(async () => {
    server = await startTestServer();
    cast = await castStudio(server, 'archive');
    live = await makeLiveSessions(host(), cast.slug, [{ hex: '#1f6f78', name: 'Deep pool' }]);

    // The host logs 210 mL into the live pot (plan 200 mL), then ends nothing: the log stands.
    const socket = await openSocket(server.url, host());
    await socket.timeout(5000).emitWithAck('live:join', { sessionId: live.liveSessionId });
    const reply = await socket.timeout(5000).emitWithAck('dyeLog:record', {
      sessionId: live.liveSessionId,
      potId: live.potId,
      recipeLineId: live.recipeLineId,
      amount: loggedMl,
    });
    expect(reply).not.toHaveProperty('error');
    socket.disconnect();

    // A second month with three colorways of known colors on another base and a food color.
    secondBase = await json<Base>(
      await host().request('POST', at('/bases'), {
        name: 'Headland DK',
        fiberContent: [{ fiber: 'wool', pct: 100 }],
        superwash: false,
        weightClass: 3,
        skeinWeightG: 115,
        skeinLengthM: 210,
      }),
      201,
    );
    moss = await json<Dye>(
      await host().request('POST', at('/dyes'), {
        kind: 'gelFoodColor',
        name: 'Moss gel',
        swatchHex: '#3f7a4a',
      }),
      201,
    );
    const colors = [
      { name: 'Ochre Rock', hex: '#c8922b' },
      { name: 'Coralline', hex: '#e07a93' },
      { name: 'Kelp Bed', hex: '#3f7a4a' },
    ];
    const ids: string[] = [];
    for (const c of colors) {
      const colorway = await json<ColorwaySummary>(
        await host().request('POST', at('/colorways'), {
          name: c.name,
          technique: 'immersion',
          baseId: secondBase.id,
          recipeLines: [{ kind: 'foodColor', dyeId: moss.id, amountPer100g: 1, unit: 'gGel' }],
          targetSwatches: [{ hex: c.hex, name: c.name.toLowerCase() }],
        }),
        201,
      );
      ids.push(colorway.id);
    }
    // A fourth, planned by eye with no target swatches: only its photo says what color it is.
    const seaGlass = await json<ColorwaySummary>(
      await host().request('POST', at('/colorways'), {
        name: 'Sea Glass',
        technique: 'immersion',
        baseId: secondBase.id,
        recipeLines: [{ kind: 'foodColor', dyeId: moss.id, amountPer100g: 0.5, unit: 'gGel' }],
      }),
      201,
    );
    const month = await makeDyeAlong(host(), cast.slug, {
      title: 'Rock pools',
      startsAt: new Date(Date.now() + 30 * 60_000).toISOString(),
      colorwayIds: [...ids, seaGlass.id],
    });
    await move(month.id, 'announced');
    await move(month.id, 'live');
    const photo = new FormData();
    photo.append('purpose', 'colorwayPhoto');
    photo.append('colorwayId', seaGlass.id);
    photo.append('swatchCount', '1');
    const png = await sharp({
      create: { width: 64, height: 48, channels: 3, background: seaGlassHex },
    })
      .png()
      .toBuffer();
    photo.append('image', new Blob([new Uint8Array(png)], { type: 'image/png' }), 'sea-glass.png');
    const image = await json<Image>(await host().request('POST', at('/images'), photo), 201);
    await json(
      await host().request('PUT', at(`/dye-alongs/${month.id}/bath-records/${seaGlass.id}`), {
        photoImageIds: [image.id],
      }),
    );
    await archiveThrough(month.id, 'live');
  });
  afterAll(() => server.close());

  it('lists a blank bath record per colorway once live, and refuses one before that', async () => {
    const list = bathRecordListSchema.parse(
      await json(await host().request('GET', at(`/dye-alongs/${live.dyeAlongId}/bath-records`))),
    );
    expect(list.editable).toBe(true);
    expect(list.records).toHaveLength(1);
    // Plan: 2 skeins × 100 g = 200 g at 30:1 = 6 000 mL (water at 1 g/mL, common practice).
    expect(list.records[0]).toMatchObject({
      colorwayId: live.potId,
      plannedFiberWeightG: 200,
      plannedBathVolumeMl: 6000,
      bathVolumeMl: null,
      archivedColorwayId: null,
    });
    const draft = await makeDyeAlong(host(), cast.slug, {
      title: 'Not yet',
      startsAt: new Date(Date.now() + 30 * 86_400_000).toISOString(),
      colorwayIds: [live.potId],
    });
    const refused = await host().request(
      'PUT',
      at(`/dye-alongs/${draft.id}/bath-records/${live.potId}`),
      {},
    );
    expect(refused.status).toBe(409);
  });

  it('saves the host’s bath record and validates it', async () => {
    const bad = await host().request(
      'PUT',
      at(`/dye-alongs/${live.dyeAlongId}/bath-records/${live.potId}`),
      { temperatureReachedC: 140 },
    );
    expect(bad.status).toBe(400);
    const record = bathRecordSchema.parse(
      await json(
        await host().request(
          'PUT',
          at(`/dye-alongs/${live.dyeAlongId}/bath-records/${live.potId}`),
          {
            fiberWeightDyedG: 200,
            bathVolumeMl: 6000,
            temperatureReachedC: 88,
            timeAtTemperatureMin: 20,
            bathExhausted: true,
            baseLot: 'SS-0412',
            dyeLots: [{ dyeName: 'Brinewell Blue', lot: 'BB-77' }],
            notes: 'Water clear after twenty minutes.',
          },
        ),
      ),
    );
    expect(record).toMatchObject({ bathVolumeMl: 6000, bathExhausted: true, baseLot: 'SS-0412' });
    const moderator = await cast.clients.moderator.request(
      'PUT',
      at(`/dye-alongs/${live.dyeAlongId}/bath-records/${live.potId}`),
      {},
    );
    expect(moderator.status).toBe(403);
  });

  it('archives the month with a snapshot the workbench cannot rewrite', async () => {
    await archiveThrough(live.dyeAlongId, 'live');
    // The host changes the workbench recipe afterwards: 3 % instead of 1 %, new swatch.
    await json(
      await host().request('PATCH', at(`/colorways/${live.potId}`), {
        recipeLines: [{ kind: 'stock', stockSolutionId: live.jarId, depthOfShadePct: 3 }],
        targetSwatches: [{ hex: '#e07a93', name: 'Changed' }],
        name: 'Renamed Teal',
      }),
    );
    const found = await search('');
    const teal = found.items.find((i) => i.dyeAlongId === live.dyeAlongId)!;
    expect(teal.colorwayName).toBe('Pool Teal');
    expect(teal.swatches).toEqual([{ hex: '#1f6f78', name: 'Deep pool' }]);
    const detail = archivedColorwayDetailSchema.parse(
      await json(await host().request('GET', at(`/archive/${teal.id}`))),
    );
    // Planned 200 mL (2 × 100 g × 1 % ÷ 1 %); logged 210 mL: +5 %. Reached DOS: 210 mL × 1 %
    // = 2.1 g of dye on 200 g = 1.05 % (common practice).
    expect(detail.lines).toEqual([
      expect.objectContaining({
        plannedAmount: 200,
        actualAmount: loggedMl,
        differencePct: 5,
        plannedDepthOfShadePct: 1,
        actualDepthOfShadePct: 1.05,
      }),
    ]);
    expect(detail.bathRecord).toMatchObject({ temperatureReachedC: 88, baseLot: 'SS-0412' });

    // The bath record stays writable after archiving; the snapshot does not move.
    await json(
      await host().request('PUT', at(`/dye-alongs/${live.dyeAlongId}/bath-records/${live.potId}`), {
        fiberWeightDyedG: 200,
        bathVolumeMl: 6000,
        notes: 'Lot noted later.',
      }),
    );
    const again = archivedColorwayDetailSchema.parse(
      await json(await host().request('GET', at(`/archive/${teal.id}`))),
    );
    expect(again.colorwayName).toBe('Pool Teal');
    expect(again.lines[0]?.plannedDepthOfShadePct).toBe(1);
    expect(again.bathRecord.notes).toBe('Lot noted later.');
  });

  it('finds colorways nearest a color first, by CIEDE2000', async () => {
    const picked = '#2f8a7c';
    const { items } = await search(`hex=${encodeURIComponent(picked)}`);
    expect(items.map((i) => i.colorwayName)).toHaveLength(5);
    // Reference: dye-kit's deltaE2000, checked against Sharma, Wu & Dalal (2005) Table 1 and
    // colorjs.io in dye-kit's color tests; here it checks the ordering and the reported values.
    const reference = (hex: string) => deltaE2000(hexToLab(picked), hexToLab(hex));
    const expected = items
      .map((i) => ({ name: i.colorwayName, d: reference(i.swatches[0]!.hex) }))
      .sort((a, b) => a.d - b.d);
    expect(items.map((i) => i.colorwayName)).toEqual(expected.map((e) => e.name));
    expect(items[0]!.colorwayName).toBe('Pool Teal');
    for (const item of items) {
      expect(item.deltaE2000).toBeCloseTo(reference(item.swatches[0]!.hex), 1);
    }
    // An exact swatch is ΔE 0 (CIEDE2000 of identical colors, Sharma et al. 2005).
    expect((await search('hex=%23e07a93')).items[0]).toMatchObject({
      colorwayName: 'Coralline',
      deltaE2000: 0,
    });
  });

  it('finds a colorway planned without swatches by the colors of its finished-skein photo', async () => {
    const [first] = (await search(`hex=${encodeURIComponent(seaGlassHex)}`)).items;
    expect(first?.colorwayName).toBe('Sea Glass');
    // The photo is one flat color, so its palette is that color: ΔE2000 under 1, the usual
    // threshold of a just-noticeable difference (common practice).
    expect(first?.deltaE2000).toBeLessThan(1);
    expect(first?.swatches).toHaveLength(1);
  });

  it('filters by base, by dye and by month', async () => {
    const byBase = await search(`baseId=${secondBase.id}`);
    expect(byBase.items.map((i) => i.colorwayName).sort()).toEqual([
      'Coralline',
      'Kelp Bed',
      'Ochre Rock',
      'Sea Glass',
    ]);
    const byDye = await search(`dyeId=${moss.id}`);
    expect(byDye.page.total).toBe(4);
    const month = byBase.items[0]!.month;
    expect((await search(`month=${month}`)).page.total).toBeGreaterThanOrEqual(4);
    expect((await search('month=2001-01')).page.total).toBe(0);
    expect((await host().request('GET', at('/archive?hex=teal'))).status).toBe(400);
  });

  it('dyes again from the actual amounts, in batches, and names the stock to mix first', async () => {
    const { items } = await search(`hex=%231f6f78`);
    const teal = items[0]!;
    const pot = await json<{ id: string }>(
      await host().request('POST', at('/pots'), {
        name: 'Six-liter pot',
        capacityMl: 6000,
        material: 'stainlessSteel',
      }),
      201,
    );
    const bases = await json<{ items: Base[] }>(await host().request('GET', at('/bases')));
    const sock = bases.items.find((b) => b.name === 'Shoreline Sock')!;
    const result = dyeAgainSchema.parse(
      await json(
        await host().request(
          'GET',
          at(
            `/archive/${teal.id}/dye-again?baseId=${sock.id}&skeins=3&potId=${pot.id}&system=metric`,
          ),
        ),
      ),
    );
    // DOS reached 1.05 % (above). Three 100 g skeins: 300 g × 1.05 % ÷ 1 % = 315 mL of stock.
    // The recorded bath, 6 000 mL on 200 g, is 30:1; one skein's bath is 3 000 mL and a 6 L pot
    // filled to 80 % holds 4 800 mL (dye-kit's fill rule): one skein a batch, 105 mL each.
    expect(result.lines[0]).toMatchObject({
      from: 'actual',
      depthOfShadePct: 1.05,
      totalAmount: 315,
    });
    expect(result.liquorRatio).toBe(30);
    expect(result.batches).toHaveLength(3);
    expect(result.batches[0]!.lines[0]!.amount).toBeCloseTo(105, 6);
    expect(result.batches[0]!.acid.amountMl).toBeGreaterThan(0);
    // The jar made 500 mL and gave 210 to the log: 290 mL left, 25 mL short of 315; 25 mL of a
    // 1 % stock holds 0.25 g of powder.
    expect(result.shelf).toEqual([
      expect.objectContaining({
        status: 'short',
        neededMl: 315,
        onShelfMl: 290,
        mixMl: 25,
        mixDyePowderG: 0.25,
      }),
    ]);
    expect(result.safetyNote).toMatch(/safety data sheet/);

    const missingBase = await host().request(
      'GET',
      at(`/archive/${teal.id}/dye-again?baseId=${pot.id}&skeins=3`),
    );
    expect(missingBase.status).toBe(404);
    const noSkeins = await host().request(
      'GET',
      at(`/archive/${teal.id}/dye-again?baseId=${sock.id}&skeins=0`),
    );
    expect(noSkeins.status).toBe(400);
  });

  it('moderators read the archive; viewers and other studios do not', async () => {
    expect((await cast.clients.moderator.request('GET', at('/archive'))).status).toBe(200);
    expect((await cast.clients.viewer.request('GET', at('/archive'))).status).toBe(403);
    expect((await cast.clients.visitor.request('GET', at('/archive'))).status).toBe(401);
  });
});
