import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { errorBodySchema } from '@vatside/contracts/errors';
import type {
  Dye,
  DyeList,
  StockSolution,
  StockSolutionDetail,
  StockSolutionList,
} from '@vatside/contracts/workbench-shelf';
import type { RunningServer } from '../server.ts';
import type { TestClient } from '../test-support/client.ts';
import { castStudio, type Cast } from '../test-support/personas.ts';
import { startTestServer } from '../test-support/test-server.ts';

describe('dye shelf: dyes and stock solutions', () => {
  let server: RunningServer;
  let cast: Cast;
  let host: TestClient;
  let at: (rest: string) => string;

  beforeAll(async () => {
    server = await startTestServer();
    cast = await castStudio(server, 'shelf');
    host = cast.clients.host;
    at = (rest) => `/api/studios/${cast.slug}${rest}`;
  });
  afterAll(() => server.close());

  const json = async <T>(res: Response, status: number): Promise<T> => {
    expect(res.status).toBe(status);
    return (await res.json()) as T;
  };
  const fieldsOf = async (res: Response) => {
    expect(res.status).toBe(400);
    return Object.keys(errorBodySchema.parse(await res.json()).error.fields ?? {});
  };
  const newDye = (name: string, extra: object = {}) =>
    host.request('POST', at('/dyes'), {
      kind: 'liquidFoodColor',
      name,
      swatchHex: '#2A7DB5',
      ...extra,
    });

  it('creates a dye with its colorants named by FD&C name and E-number', async () => {
    const dye = await json<Dye>(
      await newDye('Lagoon Blue liquid food color', { colorantIds: ['blue1', 'yellow5'] }),
      201,
    );
    expect(dye).toMatchObject({ kind: 'liquidFoodColor', swatchHex: '#2a7db5' });
    expect(dye.colorants).toEqual([
      { id: 'blue1', fdcName: 'FD&C Blue No. 1', euNumber: 'E133' },
      { id: 'yellow5', fdcName: 'FD&C Yellow No. 5', euNumber: 'E102' },
    ]);
    const read = await json<Dye>(
      await cast.clients.moderator.request('GET', at(`/dyes/${dye.id}`)),
      200,
    );
    expect(read.name).toBe('Lagoon Blue liquid food color');
  });

  it('refuses a bad kind, an unknown colorant and a swatch that is not a hex color', async () => {
    const res = await host.request('POST', at('/dyes'), {
      kind: 'glitter',
      name: 'Sparkle',
      colorantIds: ['red99'],
      swatchHex: 'teal',
    });
    expect((await fieldsOf(res)).sort()).toEqual(['colorantIds.0', 'kind', 'swatchHex']);
  });

  it('edits a dye; an empty edit is refused', async () => {
    const dye = await json<Dye>(await newDye('Sunflower gel'), 201);
    const edited = await json<Dye>(
      await host.request('PATCH', at(`/dyes/${dye.id}`), { kind: 'gelFoodColor' }),
      200,
    );
    expect(edited).toMatchObject({ kind: 'gelFoodColor', name: 'Sunflower gel' });
    expect(await fieldsOf(await host.request('PATCH', at(`/dyes/${dye.id}`), {}))).toEqual([
      '(root)',
    ]);
  });

  it('lists dyes by name, a page at a time', async () => {
    for (const name of ['Zz Page C', 'Zz Page A', 'Zz Page B']) await newDye(name);
    const all = await json<DyeList>(await host.request('GET', at('/dyes?limit=100')), 200);
    expect(all.items.map((d) => d.name).slice(-3)).toEqual(['Zz Page A', 'Zz Page B', 'Zz Page C']);
    const total = all.page.total;
    const page = await json<DyeList>(
      await host.request('GET', at(`/dyes?limit=2&offset=${total - 2}`)),
      200,
    );
    expect(page.page).toEqual({ limit: 2, offset: total - 2, total });
    expect(page.items.map((d) => d.name)).toEqual(['Zz Page B', 'Zz Page C']);
    expect(await fieldsOf(await host.request('GET', at('/dyes?limit=0')))).toEqual(['limit']);
  });

  describe('stock solutions', () => {
    let dye: Dye;
    let jar: StockSolution;

    beforeAll(async () => {
      dye = await json<Dye>(
        await newDye('Tidewater Teal acid dye', { kind: 'acidDyePowder' }),
        201,
      );
      jar = await json<StockSolution>(
        await host.request('POST', at('/stock-solutions'), {
          dyeId: dye.id,
          stockStrengthPct: 1,
          volumeMadeMl: 500,
          madeOn: '2026-03-01',
        }),
        201,
      );
    });

    it('starts full, with the dye left in it: 1 % × 500 mL = 5 g (common practice, % w/v)', () => {
      expect(jar).toMatchObject({
        dyeName: 'Tidewater Teal acid dye',
        dyeKind: 'acidDyePowder',
        volumeLeftMl: 500,
        dyeLeftG: 5,
      });
    });

    it('is adjusted by hand with a reason, and the adjustment is logged', async () => {
      const adjusted = await json<StockSolutionDetail>(
        await host.request('POST', at(`/stock-solutions/${jar.id}/adjustments`), {
          volumeLeftMl: 380,
          reason: 'Measured after the March dye-along.',
        }),
        201,
      );
      expect(adjusted.volumeLeftMl).toBe(380);
      expect(adjusted.dyeLeftG).toBeCloseTo(3.8, 10);
      expect(adjusted.adjustments[0]).toMatchObject({
        volumeLeftBeforeMl: 500,
        volumeLeftAfterMl: 380,
        reason: 'Measured after the March dye-along.',
        adjustedByName: 'Harbor Host',
      });
      const read = await json<StockSolutionDetail>(
        await cast.clients.moderator.request('GET', at(`/stock-solutions/${jar.id}`)),
        200,
      );
      expect(read.adjustments).toHaveLength(1);
    });

    it('refuses an adjustment without a reason, or to more than was made', async () => {
      const url = at(`/stock-solutions/${jar.id}/adjustments`);
      expect(await fieldsOf(await host.request('POST', url, { volumeLeftMl: 100 }))).toEqual([
        'reason',
      ]);
      const over = await host.request('POST', url, { volumeLeftMl: 900, reason: 'Topped up' });
      expect(await fieldsOf(over)).toEqual(['volumeLeftMl']);
      const read = await json<StockSolution>(
        await host.request('GET', at(`/stock-solutions/${jar.id}`)),
        200,
      );
      expect(read.volumeLeftMl).toBe(380);
    });

    it('does not change what is left through an edit; volume made cannot drop below it', async () => {
      const edited = await json<StockSolution>(
        await host.request('PATCH', at(`/stock-solutions/${jar.id}`), {
          stockStrengthPct: 2,
          volumeLeftMl: 1,
        }),
        200,
      );
      expect(edited).toMatchObject({ stockStrengthPct: 2, volumeLeftMl: 380 });
      const tooSmall = await host.request('PATCH', at(`/stock-solutions/${jar.id}`), {
        volumeMadeMl: 100,
      });
      expect(await fieldsOf(tooSmall)).toEqual(['volumeMadeMl']);
    });

    it('refuses a jar of a dye from another studio, and a jar left over what was made', async () => {
      const other = await cast.clients.otherHost.request(
        'POST',
        `/api/studios/${cast.otherSlug}/dyes`,
        {
          kind: 'acidDyePowder',
          name: 'Elsewhere Red',
          swatchHex: '#aa2222',
        },
      );
      const foreignDye = (await other.json()) as Dye;
      const res = await host.request('POST', at('/stock-solutions'), {
        dyeId: foreignDye.id,
        stockStrengthPct: 1,
        volumeMadeMl: 250,
        madeOn: '2026-03-02',
      });
      expect(await fieldsOf(res)).toEqual(['dyeId']);
      const overfull = await host.request('POST', at('/stock-solutions'), {
        dyeId: dye.id,
        stockStrengthPct: 1,
        volumeMadeMl: 250,
        volumeLeftMl: 300,
        madeOn: '2026-02-30',
      });
      expect((await fieldsOf(overfull)).sort()).toEqual(['madeOn', 'volumeLeftMl']);
    });

    it('lists jars newest first with pagination', async () => {
      await host.request('POST', at('/stock-solutions'), {
        dyeId: dye.id,
        stockStrengthPct: 0.5,
        volumeMadeMl: 250,
        madeOn: '2026-04-10',
      });
      const list = await json<StockSolutionList>(
        await host.request('GET', at('/stock-solutions?limit=1')),
        200,
      );
      expect(list.page.total).toBe(2);
      expect(list.items.map((s) => s.madeOn)).toEqual(['2026-04-10']);
    });

    it('a dye with jars cannot be deleted (409); once the jars are gone it can', async () => {
      const refused = await host.request('DELETE', at(`/dyes/${dye.id}`));
      expect(refused.status).toBe(409);
      expect(errorBodySchema.parse(await refused.json()).error.code).toBe('CONFLICT');
      const jars = await json<StockSolutionList>(
        await host.request('GET', at('/stock-solutions')),
        200,
      );
      for (const s of jars.items) {
        expect((await host.request('DELETE', at(`/stock-solutions/${s.id}`))).status).toBe(204);
      }
      expect((await host.request('DELETE', at(`/dyes/${dye.id}`))).status).toBe(204);
      expect((await host.request('GET', at(`/dyes/${dye.id}`))).status).toBe(404);
    });
  });

  it('a dye of another studio is not found here, even by its host', async () => {
    const theirs = await cast.clients.otherHost.request(
      'POST',
      `/api/studios/${cast.otherSlug}/dyes`,
      {
        kind: 'other',
        name: 'Their Ochre',
        swatchHex: '#cc9933',
      },
    );
    const { id } = (await theirs.json()) as Dye;
    expect((await host.request('GET', at(`/dyes/${id}`))).status).toBe(404);
    expect((await host.request('DELETE', at(`/dyes/${id}`))).status).toBe(404);
    expect(await fieldsOf(await host.request('GET', at('/dyes/not-a-uuid')))).toEqual(['dyeId']);
  });
});
