import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { errorBodySchema } from '@vatside/contracts/errors';
import type { Base, Pot } from '@vatside/contracts/workbench-bases';
import type {
  ColorwayDetail,
  ColorwayList,
  ColorwaySummary,
  ComputedAmounts,
  Step,
  StepList,
} from '@vatside/contracts/workbench-colorways';
import type { Dye, StockSolution } from '@vatside/contracts/workbench-shelf';
import type { RunningServer } from '../server.ts';
import type { TestClient } from '../test-support/client.ts';
import { castStudio, type Cast } from '../test-support/personas.ts';
import { startTestServer } from '../test-support/test-server.ts';

describe('colorways: recipes, dye-kit amounts and run sheets', () => {
  let server: RunningServer;
  let cast: Cast;
  let host: TestClient;
  let at: (rest: string) => string;
  let base: Base;
  let pot: Pot;
  let jar: StockSolution;
  let foodColor: Dye;
  let colorway: ColorwaySummary;

  const json = async <T>(res: Response, status: number): Promise<T> => {
    expect(res.status).toBe(status);
    return (await res.json()) as T;
  };
  const fieldsOf = async (res: Response) => {
    expect(res.status).toBe(400);
    return Object.keys(errorBodySchema.parse(await res.json()).error.fields ?? {}).sort();
  };
  const post = <T>(path: string, body: unknown) =>
    host.request('POST', at(path), body).then((r) => json<T>(r, 201));

  beforeAll(async () => {
    server = await startTestServer();
    cast = await castStudio(server, 'colorways');
    host = cast.clients.host;
    at = (rest) => `/api/studios/${cast.slug}${rest}`;
    base = await post<Base>('/bases', {
      name: 'Harbor Sock',
      fiberContent: [{ fiber: 'wool', pct: 100 }],
      superwash: true,
      weightClass: 1,
      skeinWeightG: 100,
      skeinLengthM: 425,
    });
    pot = await post<Pot>('/pots', {
      name: 'Old aluminum',
      capacityMl: 8_000,
      material: 'aluminum',
    });
    const acidDye = await post<Dye>('/dyes', {
      kind: 'acidDyePowder',
      name: 'Tidewater Teal acid dye',
      swatchHex: '#1f6f78',
    });
    jar = await post<StockSolution>('/stock-solutions', {
      dyeId: acidDye.id,
      stockStrengthPct: 1,
      volumeMadeMl: 500,
      madeOn: '2026-03-01',
    });
    foodColor = await post<Dye>('/dyes', {
      kind: 'liquidFoodColor',
      name: 'Lagoon Blue liquid food color',
      colorantIds: ['blue1'],
      swatchHex: '#2a7db5',
    });
    colorway = await post<ColorwaySummary>('/colorways', {
      name: 'Rock Pool',
      technique: 'immersion',
      baseId: base.id,
      potId: pot.id,
      liquorRatio: 30,
      acid: { acid: 'vinegar', acidStrengthPct: 5 },
      recipeLines: [
        { kind: 'stock', stockSolutionId: jar.id, depthOfShadePct: 2 },
        { kind: 'foodColor', dyeId: foodColor.id, amountPer100g: 2, unit: 'mL' },
      ],
      targetSwatches: [{ hex: '#1F6F78', name: 'Pool water' }],
    });
  });
  afterAll(() => server.close());

  it('fills lines from the shelf and the skein weight from the base', () => {
    expect(colorway.weightOfGoodsG).toBe(100);
    expect(colorway.recipeLines[0]).toMatchObject({
      kind: 'stock',
      stockSolutionId: jar.id,
      dyeName: 'Tidewater Teal acid dye',
      stockStrengthPct: 1,
      depthOfShadePct: 2,
    });
    expect(colorway.recipeLines[1]).toMatchObject({
      kind: 'foodColor',
      dyeId: foodColor.id,
      colorName: 'Lagoon Blue liquid food color',
      colorants: ['blue1'],
    });
    expect(colorway.recipeLines.every((l) => /^[0-9a-f-]{36}$/.test(l.id))).toBe(true);
    expect(colorway.targetSwatches).toEqual([{ hex: '#1f6f78', name: 'Pool water' }]);
  });

  it('amounts for a 115 g skein match the hand calculation', async () => {
    const res = await cast.clients.moderator.request(
      'GET',
      at(`/colorways/${colorway.id}/amounts?weightOfGoodsG=115&system=us`),
    );
    const { amounts, acid, warnings, safetyNote } = await json<ComputedAmounts>(res, 200);
    const [stock, food] = amounts.lines;
    // Stock: WOG × DOS ÷ stock strength = 115 g × 2 % ÷ 1 % = 230 mL (common practice).
    expect(stock!.volumeMl).toBeCloseTo(230, 9);
    // Dye in it: 115 g × 2 % = 2.3 g (common practice).
    expect(stock!.dyeMassG).toBeCloseTo(2.3, 9);
    // Food color per 100 g of dry fiber: 2 mL × 115 ÷ 100 = 2.3 mL (common practice).
    expect(food!.volumeMl).toBeCloseTo(2.3, 9);
    // Bath at a 30:1 liquor ratio: 115 g × 30 = 3450 mL (water at 1 g/mL, common practice).
    expect(amounts.bathVolumeMl).toBeCloseTo(3450, 9);
    // 5 % vinegar, middle of 15–60 mL per liter of bath: 37.5 mL/L × 3.45 L = 129.375 mL
    // (common practice, from memory: see packages/dye-kit/test-data/README.md).
    expect(acid.recommendedMl).toBeCloseTo(129.375, 9);
    expect(amounts.acid.amountMl).toBeCloseTo(129.375, 9);
    expect(acid.rule).toMatch(/common practice/);
    expect(warnings.map((w) => w.code)).toEqual(
      expect.arrayContaining(['ALUMINUM_POT', 'BLUE_EXHAUSTS_SLOWLY', 'SUPERWASH_STRIKES_FAST']),
    );
    expect(safetyNote).toMatch(/not food or drink/);
    expect(JSON.stringify({ amounts, acid, warnings })).not.toMatch(/safe to (eat|ingest|drink)/i);
  });

  it('the colorway itself carries the amounts for the host’s skeins, in the units asked for', async () => {
    const detail = await json<ColorwayDetail>(
      await host.request('GET', at(`/colorways/${colorway.id}?system=metric`)),
      200,
    );
    expect(detail.computed.system).toBe('metric');
    // One 100 g skein: 100 g × 2 % ÷ 1 % = 200 mL of stock (common practice).
    expect(detail.computed.amounts.lines[0]!.volumeMl).toBeCloseTo(200, 9);
    expect(detail.computed.amounts.skeins).toBe(1);
  });

  it('three skeins in a 5 L pot are split into batches at the same liquor ratio', async () => {
    const { amounts, warnings } = await json<ComputedAmounts>(
      await host.request(
        'GET',
        at(`/colorways/${colorway.id}/amounts?skeins=3&potCapacityMl=5000`),
      ),
      200,
    );
    // One skein's bath is 100 g × 30 = 3000 mL; 80 % of 5 L (4000 mL) holds one (common practice).
    expect(amounts.batches.map((b) => b.bathVolumeMl)).toEqual([3000, 3000, 3000]);
    expect(warnings.map((w) => w.code)).toContain('SPLIT_INTO_BATCHES');
  });

  it('refuses a bad amounts query', async () => {
    const url = at(`/colorways/${colorway.id}/amounts`);
    expect(await fieldsOf(await host.request('GET', `${url}?weightOfGoodsG=115&skeins=2`))).toEqual(
      ['skeins'],
    );
    expect(
      await fieldsOf(await host.request('GET', `${url}?weightOfGoodsG=-5&system=imperial`)),
    ).toEqual(['system', 'weightOfGoodsG']);
  });

  it('refuses incomplete lines, a jar of another studio, and a colorway with no skein weight', async () => {
    const loose = await host.request('POST', at('/colorways'), {
      name: 'Loose',
      technique: 'speckle',
      weightOfGoodsG: 100,
      recipeLines: [{ kind: 'stock', depthOfShadePct: 1 }],
    });
    expect(await fieldsOf(loose)).toEqual([
      'recipeLines.0.dyeName',
      'recipeLines.0.stockStrengthPct',
    ]);
    const theirs = await cast.clients.otherHost.request(
      'POST',
      `/api/studios/${cast.otherSlug}/dyes`,
      {
        kind: 'acidDyePowder',
        name: 'Their Red',
        swatchHex: '#aa2222',
      },
    );
    const theirJar = await cast.clients.otherHost.request(
      'POST',
      `/api/studios/${cast.otherSlug}/stock-solutions`,
      {
        dyeId: ((await theirs.json()) as Dye).id,
        stockStrengthPct: 1,
        volumeMadeMl: 100,
        madeOn: '2026-03-01',
      },
    );
    const foreign = await host.request('POST', at('/colorways'), {
      name: 'Borrowed',
      technique: 'immersion',
      weightOfGoodsG: 100,
      recipeLines: [
        {
          kind: 'stock',
          stockSolutionId: ((await theirJar.json()) as StockSolution).id,
          depthOfShadePct: 1,
        },
      ],
    });
    expect(await fieldsOf(foreign)).toEqual(['recipeLines.0.stockSolutionId']);
    const weightless = await host.request('POST', at('/colorways'), {
      name: 'Weightless',
      technique: 'leftovers',
    });
    expect(await fieldsOf(weightless)).toEqual(['weightOfGoodsG']);
  });

  it('warns when the depth of shade is past what wool takes up (about 4 %, common practice)', async () => {
    const deep = await post<ColorwaySummary>('/colorways', {
      name: 'Deep Kelp',
      technique: 'immersion',
      weightOfGoodsG: 100,
      recipeLines: [{ kind: 'stock', dyeName: 'Kelp', stockStrengthPct: 2, depthOfShadePct: 5 }],
    });
    const detail = await json<ColorwayDetail>(
      await host.request('GET', at(`/colorways/${deep.id}`)),
      200,
    );
    expect(detail.computed.warnings.map((w) => w.code)).toContain('DEPTH_OF_SHADE_HIGH');
  });

  it('lists colorways a page at a time, most recently changed first', async () => {
    const touched = await json<ColorwaySummary>(
      await host.request('PATCH', at(`/colorways/${colorway.id}`), { notes: 'Rinse until clear.' }),
      200,
    );
    expect(touched.notes).toBe('Rinse until clear.');
    const list = await json<ColorwayList>(
      await cast.clients.moderator.request('GET', at('/colorways?limit=1')),
      200,
    );
    expect(list.page.total).toBeGreaterThanOrEqual(2);
    expect(list.items.map((c) => c.id)).toEqual([colorway.id]);
  });

  describe('run sheet', () => {
    let steps: Step[];
    const stepsUrl = () => at(`/colorways/${colorway.id}/steps`);

    beforeAll(async () => {
      const [stockLine, foodLine] = colorway.recipeLines;
      steps = [];
      for (const body of [
        {
          instruction: 'Soak the skein in warm water with a splash of vinegar.',
          timerSeconds: 1800,
        },
        {
          instruction: 'Stir the teal stock into the pot.',
          recipeLineId: stockLine!.id,
          caution: 'powder',
        },
        { instruction: 'Add the blue food color.', recipeLineId: foodLine!.id, caution: 'acid' },
        {
          instruction: 'Hold at a simmer.',
          timerSeconds: 1800,
          temperatureC: 88,
          visualCue: 'Steam rising, tiny bubbles on the bottom, none breaking the surface.',
          caution: 'hotBath',
        },
      ]) {
        steps.push(await json<Step>(await host.request('POST', stepsUrl(), body), 201));
      }
    });

    it('appends steps in order, with their cautions', () => {
      expect(steps.map((s) => s.position)).toEqual([1, 2, 3, 4]);
      expect(steps.map((s) => s.caution)).toEqual(['none', 'powder', 'acid', 'hotBath']);
      expect(steps[3]).toMatchObject({ temperatureC: 88, timerSeconds: 1800 });
    });

    it('a temperature needs a visual cue, on create and on edit', async () => {
      const bare = await host.request('POST', stepsUrl(), {
        instruction: 'Heat.',
        temperatureC: 85,
      });
      expect(await fieldsOf(bare)).toEqual(['visualCue']);
      const edit = await host.request('PATCH', `${stepsUrl()}/${steps[0]!.id}`, {
        temperatureC: 40,
      });
      expect(await fieldsOf(edit)).toEqual(['visualCue']);
      const ok = await json<Step>(
        await host.request('PATCH', `${stepsUrl()}/${steps[0]!.id}`, {
          temperatureC: 40,
          visualCue: 'Warm to the touch, like a bath.',
        }),
        200,
      );
      expect(ok).toMatchObject({ temperatureC: 40, position: 1 });
    });

    it('an amount must come from this colorway’s recipe lines', async () => {
      const res = await host.request('POST', stepsUrl(), {
        instruction: 'Add something.',
        recipeLineId: '00000000-0000-4000-8000-000000000000',
      });
      expect(await fieldsOf(res)).toEqual(['recipeLineId']);
    });

    it('reorders by the ordered ids; a list that is not the whole run sheet is refused', async () => {
      const [a, b, c, d] = steps.map((s) => s.id);
      const order = [d!, a!, c!, b!];
      const { steps: reordered } = await json<StepList>(
        await host.request('PUT', `${stepsUrl()}/order`, { stepIds: order }),
        200,
      );
      expect(reordered.map((s) => s.id)).toEqual(order);
      expect(reordered.map((s) => s.position)).toEqual([1, 2, 3, 4]);
      const partial = await host.request('PUT', `${stepsUrl()}/order`, { stepIds: [a, b, c] });
      expect(await fieldsOf(partial)).toEqual(['stepIds']);
      const twice = await host.request('PUT', `${stepsUrl()}/order`, { stepIds: [a, a, b, c] });
      expect(await fieldsOf(twice)).toEqual(['stepIds']);
      const read = await json<StepList>(
        await cast.clients.moderator.request('GET', stepsUrl()),
        200,
      );
      expect(read.steps.map((s) => s.id)).toEqual(order);
    });

    it('deleting a step closes the gap', async () => {
      const { steps: before } = await json<StepList>(await host.request('GET', stepsUrl()), 200);
      const { steps: after } = await json<StepList>(
        await host.request('DELETE', `${stepsUrl()}/${before[1]!.id}`),
        200,
      );
      expect(after.map((s) => s.id)).toEqual([before[0]!.id, before[2]!.id, before[3]!.id]);
      expect(after.map((s) => s.position)).toEqual([1, 2, 3]);
    });

    it('a step whose recipe line is removed keeps its words and loses the amount', async () => {
      const [stockLine, foodLine] = colorway.recipeLines;
      const updated = await json<ColorwaySummary>(
        await host.request('PATCH', at(`/colorways/${colorway.id}`), {
          recipeLines: [{ ...foodLine, amountPer100g: 3 }],
        }),
        200,
      );
      expect(updated.recipeLines.map((l) => l.id)).toEqual([foodLine!.id]);
      const { steps: now } = await json<StepList>(await host.request('GET', stepsUrl()), 200);
      const stir = now.find((s) => s.instruction.startsWith('Stir the teal'));
      const blue = now.find((s) => s.instruction.startsWith('Add the blue'));
      expect(stir?.recipeLineId).toBeNull();
      expect(blue?.recipeLineId).toBe(foodLine!.id);
      expect(stockLine).toBeDefined();
    });

    it('deleting the colorway deletes its run sheet', async () => {
      expect((await host.request('DELETE', at(`/colorways/${colorway.id}`))).status).toBe(204);
      expect((await host.request('GET', stepsUrl())).status).toBe(404);
      expect((await host.request('GET', at(`/colorways/${colorway.id}`))).status).toBe(404);
    });
  });
});
