import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { errorBodySchema } from '@vatside/contracts/errors';
import type { Base, BaseList, Pot, PotList } from '@vatside/contracts/workbench-bases';
import type { RunningServer } from '../server.ts';
import type { TestClient } from '../test-support/client.ts';
import { castStudio, type Cast } from '../test-support/personas.ts';
import { startTestServer } from '../test-support/test-server.ts';

const sockBase = {
  name: 'Harbor Sock',
  fiberContent: [
    { fiber: 'wool', pct: 75 },
    { fiber: 'nylon', pct: 25 },
  ],
  superwash: true,
  weightClass: 1, // super fine (sock), Craft Yarn Council
  skeinWeightG: 100,
  skeinLengthM: 425,
  lot: 'HS-0412',
};

describe('bases and pots', () => {
  let server: RunningServer;
  let cast: Cast;
  let host: TestClient;
  let at: (rest: string) => string;

  beforeAll(async () => {
    server = await startTestServer();
    cast = await castStudio(server, 'bases');
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

  it('a wool/nylon superwash base: all of it takes dye; superwash strikes fast (dye-kit fiber check)', async () => {
    const base = await json<Base>(await host.request('POST', at('/bases'), sockBase), 201);
    expect(base).toMatchObject({
      ...sockBase,
      fiberCheck: { takesDyePct: 100, doesNotTakePct: 0 },
    });
    expect(base.fiberCheck.warnings.map((w) => w.code)).toEqual(['SUPERWASH_STRIKES_FAST']);
  });

  it('a wool/cotton blend warns that only part of it takes the color', async () => {
    const base = await json<Base>(
      await host.request('POST', at('/bases'), {
        ...sockBase,
        name: 'Driftwood Blend',
        superwash: false,
        fiberContent: [
          { fiber: 'wool', pct: 70 },
          { fiber: 'cotton', pct: 30 },
        ],
      }),
      201,
    );
    expect(base.fiberCheck).toMatchObject({ takesDyePct: 70, doesNotTakePct: 30 });
    expect(base.fiberCheck.warnings.map((w) => w.code).sort()).toEqual([
      'FIBER_BLEND',
      'WOOL_FELTS',
    ]);
  });

  it('refuses fibers that do not add up to 100 %, an unknown fiber and a weight class past 7', async () => {
    const notHundred = await host.request('POST', at('/bases'), {
      ...sockBase,
      fiberContent: [{ fiber: 'wool', pct: 80 }],
    });
    expect(await fieldsOf(notHundred)).toEqual(['fiberContent']);
    const unknown = await host.request('POST', at('/bases'), {
      ...sockBase,
      fiberContent: [{ fiber: 'moonbeam', pct: 100 }],
      weightClass: 8,
    });
    expect((await fieldsOf(unknown)).sort()).toEqual(['fiberContent.0.fiber', 'weightClass']);
  });

  it('edits a base; an edit that breaks the fiber content is refused and changes nothing', async () => {
    const base = await json<Base>(
      await host.request('POST', at('/bases'), { ...sockBase, name: 'Edit Me' }),
      201,
    );
    const edited = await json<Base>(
      await host.request('PATCH', at(`/bases/${base.id}`), { lot: 'HS-0501', skeinWeightG: 115 }),
      200,
    );
    expect(edited).toMatchObject({ lot: 'HS-0501', skeinWeightG: 115, name: 'Edit Me' });
    const broken = await host.request('PATCH', at(`/bases/${base.id}`), {
      fiberContent: [{ fiber: 'wool', pct: 50 }],
    });
    expect(await fieldsOf(broken)).toEqual(['fiberContent']);
    const read = await json<Base>(
      await cast.clients.moderator.request('GET', at(`/bases/${base.id}`)),
      200,
    );
    expect(read.fiberContent).toEqual(sockBase.fiberContent);
    expect((await host.request('DELETE', at(`/bases/${base.id}`))).status).toBe(204);
    expect((await host.request('GET', at(`/bases/${base.id}`))).status).toBe(404);
  });

  it('lists bases a page at a time', async () => {
    const first = await json<BaseList>(await host.request('GET', at('/bases?limit=1')), 200);
    const second = await json<BaseList>(
      await host.request('GET', at('/bases?limit=1&offset=1')),
      200,
    );
    expect(first.page.total).toBe(2);
    expect(first.items[0]!.id).not.toBe(second.items[0]!.id);
  });

  it('pots: an aluminum pot is flagged; capacity must be positive', async () => {
    const steel = await json<Pot>(
      await host.request('POST', at('/pots'), {
        name: 'Big steel',
        capacityMl: 12_000,
        material: 'stainlessSteel',
      }),
      201,
    );
    const alu = await json<Pot>(
      await host.request('POST', at('/pots'), {
        name: 'Old aluminum',
        capacityMl: 6_000,
        material: 'aluminum',
      }),
      201,
    );
    expect([steel.reactsWithAcid, alu.reactsWithAcid]).toEqual([false, true]);
    const bad = await host.request('POST', at('/pots'), {
      name: 'Thimble',
      capacityMl: 0,
      material: 'copper',
    });
    expect((await fieldsOf(bad)).sort()).toEqual(['capacityMl', 'material']);
    const edited = await json<Pot>(
      await host.request('PATCH', at(`/pots/${alu.id}`), { material: 'enamel' }),
      200,
    );
    expect(edited.reactsWithAcid).toBe(false);
    const list = await json<PotList>(await cast.clients.moderator.request('GET', at('/pots')), 200);
    expect(list.items.map((p) => p.name)).toEqual(['Big steel', 'Old aluminum']);
    expect((await host.request('DELETE', at(`/pots/${steel.id}`))).status).toBe(204);
  });
});
