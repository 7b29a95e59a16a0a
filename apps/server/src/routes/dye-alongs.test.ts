import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { errorBodySchema } from '@vatside/contracts/errors';
import type { SupplyList } from '@vatside/contracts/dye-along-supplies';
import type { DyeAlongDetail, DyeAlongList, PublicDyeAlong } from '@vatside/contracts/dye-alongs';
import type { Image } from '@vatside/contracts/workbench-images';
import type { RunningServer } from '../server.ts';
import type { TestClient } from '../test-support/client.ts';
import {
  inDays,
  makeDyeAlong,
  makeMonth,
  type TestMonth,
} from '../test-support/dye-along-fixtures.ts';
import { castStudio, type Cast } from '../test-support/personas.ts';
import { startTestServer } from '../test-support/test-server.ts';
import { bandedPng } from '../uploads/test-images.ts';

describe('dye-alongs: lifecycle, visibility, month lists, supplies', () => {
  let server: RunningServer;
  let cast: Cast;
  let host: TestClient;
  let month: TestMonth;
  const at = (rest: string) => `/api/studios/${cast.slug}/dye-alongs${rest}`;

  const json = async <T>(res: Response, status: number): Promise<T> => {
    const body = (await res.json()) as T;
    expect(res.status, JSON.stringify(body)).toBe(status);
    return body;
  };
  const move = (id: string, to: string) => host.request('POST', at(`/${id}/transitions`), { to });
  async function refused(res: Response, reason: RegExp) {
    expect(res.status).toBe(409);
    const body = errorBodySchema.parse(await res.json());
    expect(body.error.code).toBe('CONFLICT');
    expect(body.error.message).toMatch(reason);
  }

  beforeAll(async () => {
    server = await startTestServer();
    cast = await castStudio(server, 'dyealong');
    host = cast.clients.host;
    month = await makeMonth(host, cast.slug);
  });
  afterAll(() => server.close());

  describe('status transitions', () => {
    it('refuses to announce without a colorway, then announces with one', async () => {
      const draft = await makeDyeAlong(host, cast.slug, { startsAt: inDays(20).toISOString() });
      expect(draft.status).toBe('draft');
      expect(draft.nextStatuses).toEqual([
        { to: 'announced', allowed: false, reasons: ['Add at least one colorway.'] },
      ]);
      await refused(await move(draft.id, 'announced'), /Add at least one colorway/);
      await json(
        await host.request('PATCH', at(`/${draft.id}`), { colorwayIds: [month.colorway.id] }),
        200,
      );
      const announced = await json<DyeAlongDetail>(await move(draft.id, 'announced'), 200);
      expect(announced.status).toBe('announced');
      expect(announced.announcedAt).not.toBeNull();
    });

    it('refuses to announce a start in the past', async () => {
      const late = await makeDyeAlong(host, cast.slug, {
        startsAt: inDays(-1).toISOString(),
        colorwayIds: [month.colorway.id],
      });
      await refused(await move(late.id, 'announced'), /start time has passed/);
    });

    it('moves on one step at a time and never back past live', async () => {
      // Starts within the two hours in which a host may open the live session.
      const soon = await makeDyeAlong(host, cast.slug, {
        startsAt: new Date(Date.now() + 3600_000).toISOString(),
        colorwayIds: [month.colorway.id],
      });
      await refused(
        await move(soon.id, 'live'),
        /one step at a time: from draft it goes to announced/,
      );
      await json(await move(soon.id, 'announced'), 200);
      await json(await move(soon.id, 'draft'), 200); // withdrawn before going live: allowed
      await json(await move(soon.id, 'announced'), 200);
      await refused(await move(soon.id, 'announced'), /already announced/);
      await json(await move(soon.id, 'live'), 200);
      await refused(await move(soon.id, 'draft'), /gone live, so it cannot go back to draft/);
      await refused(await move(soon.id, 'announced'), /gone live/);
      // From live on, the start and the colorways are the record.
      await refused(
        await host.request('PATCH', at(`/${soon.id}`), { startsAt: inDays(3).toISOString() }),
        /gone live/,
      );
      const sharing = await json<DyeAlongDetail>(await move(soon.id, 'sharing'), 200);
      expect(sharing.shareOpensAt).not.toBeNull();
      await json(await move(soon.id, 'recap'), 200);
      await json(await move(soon.id, 'archived'), 200);
      await refused(await move(soon.id, 'recap'), /archived dye-along stays archived/);
      await refused(await host.request('DELETE', at(`/${soon.id}`)), /Only a draft can be deleted/);
    });

    it('refuses going live days ahead of the start', async () => {
      const later = await makeDyeAlong(host, cast.slug, {
        startsAt: inDays(10).toISOString(),
        colorwayIds: [month.colorway.id],
      });
      await json(await move(later.id, 'announced'), 200);
      await refused(await move(later.id, 'live'), /from 2 hours before its start/);
    });

    it('only the host moves it; a moderator may read but not announce', async () => {
      const draft = await makeDyeAlong(host, cast.slug, {
        startsAt: inDays(12).toISOString(),
        colorwayIds: [month.colorway.id],
      });
      const res = await cast.clients.moderator.request('POST', at(`/${draft.id}/transitions`), {
        to: 'announced',
      });
      expect(res.status).toBe(403);
      const read = await cast.clients.moderator.request('GET', at(`/${draft.id}`));
      expect((await json<DyeAlongDetail>(read, 200)).status).toBe('draft');
    });
  });

  describe('times and zones', () => {
    it('reads the host’s wall clock in their zone and stores the instant', async () => {
      const d = await makeDyeAlong(host, cast.slug, {
        startsAtLocal: '2027-01-16T14:00',
        timeZone: 'America/Halifax',
      });
      // Halifax keeps Atlantic Standard Time (UTC−4) in January.
      expect(d.startsAt).toBe('2027-01-16T18:00:00.000Z');
      expect(d.startsAtHost.label).toMatch(/^Saturday, January 16, 2027 at 2:00 PM/);
    });

    it('refuses a wall-clock time the spring clock change skips', async () => {
      // US clocks go from 2:00 to 3:00 on the second Sunday of March (2027-03-14).
      const res = await host.request('POST', at(''), {
        title: 'No such time',
        startsAtLocal: '2027-03-14T02:30',
        timeZone: 'America/New_York',
      });
      expect(res.status).toBe(400);
      const body = errorBodySchema.parse(await res.json());
      expect(Object.keys(body.error.fields ?? {})).toEqual(['startsAtLocal']);
    });

    it('lists by month on the dye-along’s own clock, or on a given one', async () => {
      // 23:30 on January 31 in Halifax is already February 1 in Berlin.
      const edge = await makeDyeAlong(host, cast.slug, {
        title: 'Month edge',
        startsAtLocal: '2027-01-31T23:30',
        timeZone: 'America/Halifax',
      });
      const list = async (q: string) =>
        (await json<DyeAlongList>(await host.request('GET', at(q)), 200)).items.map((d) => d.id);
      expect(await list('?month=2027-01')).toContain(edge.id);
      expect(await list('?month=2027-02')).not.toContain(edge.id);
      expect(await list('?month=2027-02&timeZone=Europe/Berlin')).toContain(edge.id);
      expect(await list('?month=2027-01&timeZone=Europe/Berlin')).not.toContain(edge.id);
    });

    it('refuses a stream link that is not https and an unknown zone', async () => {
      const res = await host.request('POST', at(''), {
        title: 'Bad',
        startsAt: inDays(5).toISOString(),
        timeZone: 'Mars/Olympus',
        streamUrl: 'http://stream.example/live',
      });
      const body = errorBodySchema.parse(await json(res, 400));
      expect(Object.keys(body.error.fields ?? {}).sort()).toEqual(['streamUrl', 'timeZone']);
    });
  });

  describe('who sees what', () => {
    let draftId: string;
    let image: Image;

    beforeAll(async () => {
      const form = new FormData();
      form.append('purpose', 'inspiration');
      form.append('image', new Blob([await bandedPng()], { type: 'image/png' }), 'pool.png');
      image = await json<Image>(
        await host.request('POST', `/api/studios/${cast.slug}/images`, form),
        201,
      );
      const draft = await makeDyeAlong(host, cast.slug, {
        title: 'Visibility month',
        startsAtLocal: '2027-02-13T14:00',
        colorwayIds: [month.colorway.id],
        inspirationImageId: image.id,
        streamUrl: 'https://stream.example/wrackline',
      });
      draftId = draft.id;
    });

    it('a draft is hidden from visitors and viewers, shown to the host and moderators', async () => {
      for (const who of ['visitor', 'viewer', 'otherHost'] as const) {
        const res = await cast.clients[who].request('GET', at(`/${draftId}/public`));
        expect(res.status, who).toBe(404);
        const img = await cast.clients[who].request('GET', at(`/${draftId}/inspiration/web`));
        expect(img.status, who).toBe(404);
        const listed = await json<DyeAlongList>(
          await cast.clients[who].request('GET', at('?month=2027-02')),
          200,
        );
        expect(listed.items.map((d) => d.id)).not.toContain(draftId);
      }
      for (const who of ['host', 'moderator'] as const) {
        const res = await cast.clients[who].request('GET', at(`/${draftId}/public`));
        expect(res.status, who).toBe(200);
      }
      // Not even staff get the public image route for a draft: it serves announced ones only.
      expect((await host.request('GET', at(`/${draftId}/inspiration/web`))).status).toBe(404);
    });

    it('once announced, a visitor reads the page, the image and the calendar file', async () => {
      await json(await move(draftId, 'announced'), 200);
      const visitor = cast.clients.visitor;
      const page = await json<PublicDyeAlong>(
        await visitor.request(
          'GET',
          at(`/${draftId}/public?weightOfGoodsG=50&system=us&timeZone=Asia/Tokyo`),
        ),
        200,
      );
      expect(page.studio.slug).toBe(cast.slug);
      expect(page.streamUrl).toBe('https://stream.example/wrackline');
      // 14:00 in Halifax (UTC−4) is 18:00 UTC, 03:00 the next day in Tokyo (UTC+9).
      expect(page.startsAtLocal.local).toBe('2027-02-14T03:00');
      expect(page.inspiration?.palette.length).toBeGreaterThan(0);
      expect(page.supplyList.weightOfGoodsG).toBe(50);
      expect(page.supplyList.system).toBe('us');
      // 50 g × 1 % ÷ 1 % stock = 50 mL of Brinewell Blue stock.
      expect(page.supplyList.dyes[0]).toMatchObject({ name: 'Brinewell Blue', amount: 50 });
      expect(page.prepChecklist.dayBefore.map((i) => i.id)).toContain('tie-skeins');
      expect(page.cautions.join(' ')).toMatch(/safety data sheet/);

      const img = await visitor.request('GET', page.inspiration!.webUrl);
      expect(img.status).toBe(200);
      expect(img.headers.get('content-type')).toBe('image/jpeg');
      const ics = await visitor.request('GET', page.calendarUrl);
      expect(ics.headers.get('content-type')).toMatch(/^text\/calendar/);
      expect(await ics.text()).toMatch(/DTSTART:20270213T180000Z/);

      const listed = await json<DyeAlongList>(
        await visitor.request('GET', at('?month=2027-02')),
        200,
      );
      expect(listed.items.map((d) => d.id)).toContain(draftId);
      // The host's own detail (with mail counts) stays with staff.
      expect((await visitor.request('GET', at(`/${draftId}`))).status).toBe(401);
    });

    it('the supply list for the host’s batch sums every skein', async () => {
      const res = await cast.clients.visitor.request(
        'GET',
        at(`/${draftId}/supply-list?scope=hostBatch&system=metric`),
      );
      const { supplyList } = await json<{ supplyList: SupplyList }>(res, 200);
      // Two 100 g skeins at 1 % from a 1 % stock: 2 × 100 × 1 ÷ 1 = 200 mL.
      expect(supplyList.dyes[0]?.volumeMl).toBeCloseTo(200, 9);
      expect(supplyList.yarn[0]).toMatchObject({
        name: 'Shoreline Sock',
        skeins: 2,
        totalWeightG: 200,
      });
    });
  });

  it('refuses a colorway or image from another studio', async () => {
    const res = await host.request('POST', at(''), {
      title: 'Borrowed',
      startsAt: inDays(8).toISOString(),
      timeZone: 'UTC',
      colorwayIds: ['00000000-0000-4000-8000-000000000000'],
    });
    const body = errorBodySchema.parse(await json(res, 400));
    expect(Object.keys(body.error.fields ?? {})).toEqual(['colorwayIds.0']);
  });
});
