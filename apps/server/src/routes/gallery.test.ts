import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Gallery, Recap } from '@vatside/contracts/gallery';
import type { Submission } from '@vatside/contracts/submissions';
import type { Image } from '@vatside/contracts/workbench-images';
import type { RunningServer } from '../server.ts';
import { castStudio, type Cast } from '../test-support/personas.ts';
import { makeSharingMonth, share, type SharingMonth } from '../test-support/sharing-fixtures.ts';
import { startTestServer } from '../test-support/test-server.ts';
import { bandedPng } from '../uploads/test-images.ts';

describe('the public gallery and the recap running order', () => {
  let server: RunningServer;
  let cast: Cast;
  let month: SharingMonth;
  const skeins: Record<
    | 'waiting'
    | 'approved'
    | 'approvedOther'
    | 'featured'
    | 'rejected'
    | 'needsChanges'
    | 'withdrawn',
    Submission
  > = {} as never;
  const at = (rest: string) => `/api/studios/${cast.slug}${rest}`;
  const decide = (id: string, body: unknown) =>
    cast.clients.host.request('POST', at(`/review/submissions/${id}/decisions`), body);
  const galleryPage = async (query = '') => {
    const res = await cast.clients.visitor.request(
      'GET',
      at(`/dye-alongs/${month.dyeAlong.id}/gallery?${query}`),
    );
    expect(res.status).toBe(200);
    return (await res.json()) as Gallery;
  };
  const recapPath = () => at(`/dye-alongs/${month.dyeAlong.id}/recap`);

  beforeAll(async () => {
    server = await startTestServer();
    cast = await castStudio(server, 'gallery');
    month = await makeSharingMonth(cast.clients.host, cast.slug);
    const viewer = cast.clients.viewer;
    for (const key of Object.keys({
      waiting: 0,
      approved: 0,
      approvedOther: 0,
      featured: 0,
      rejected: 0,
      needsChanges: 0,
      withdrawn: 0,
    }) as (keyof typeof skeins)[]) {
      const withColorway = key === 'approved' || key === 'featured';
      skeins[key] = await share(viewer, cast, month.dyeAlong.id, {
        details: {
          consentToFeature: key !== 'approved',
          colorwayId: withColorway ? month.colorwayId : null,
        },
      });
    }
    await decide(skeins.approved.id, { decision: 'approve' });
    await decide(skeins.approvedOther.id, { decision: 'approve' });
    await decide(skeins.featured.id, { decision: 'feature' });
    await decide(skeins.rejected.id, { decision: 'reject', reasonTemplate: 'notYarn' });
    await decide(skeins.needsChanges.id, { decision: 'needsChanges', reasonTemplate: 'blurry' });
    await decide(skeins.withdrawn.id, { decision: 'approve' });
    await viewer.request('DELETE', at(`/my-submissions/${skeins.withdrawn.id}`));
  });
  afterAll(() => server.close());

  it('visitors see approved and featured skeins only, featured first, never a reason', async () => {
    const page = await galleryPage('limit=100');
    expect(page.items.map((s) => s.id)).toEqual([
      skeins.featured.id,
      skeins.approved.id,
      skeins.approvedOther.id,
    ]);
    expect(page.items[0]).toMatchObject({ featured: true, makerName: 'Vale Viewer' });
    expect(page.colorways.map((c) => c.id)).toEqual([month.colorwayId]);
    const text = JSON.stringify(page);
    for (const hidden of [skeins.waiting, skeins.rejected, skeins.needsChanges, skeins.withdrawn]) {
      expect(text).not.toContain(hidden.id);
    }
    expect(text).not.toMatch(/reason|consent|blurry/i);
  });

  it('paginates without gaps or repeats, and filters by colorway', async () => {
    const first = await galleryPage('limit=2&offset=0');
    const second = await galleryPage('limit=2&offset=2');
    expect(first.page).toEqual({ limit: 2, offset: 0, total: 3 });
    expect([...first.items, ...second.items].map((s) => s.id)).toEqual([
      skeins.featured.id,
      skeins.approved.id,
      skeins.approvedOther.id,
    ]);
    const filtered = await galleryPage(`colorwayId=${month.colorwayId}`);
    expect(filtered.items.map((s) => s.id)).toEqual([skeins.featured.id, skeins.approved.id]);
  });

  it('photos: public once approved; before that only the sharer and the staff', async () => {
    const publicPhoto = skeins.approved.photos[0]!.thumbUrl;
    const res = await cast.clients.visitor.request('GET', publicPhoto);
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toBe('image/jpeg');
    expect(res.headers.get('x-content-type-options')).toBe('nosniff');
    expect(res.headers.get('cache-control')).toMatch(/^public/);

    for (const key of ['waiting', 'rejected', 'needsChanges'] as const) {
      const url = skeins[key].photos[0]!.webUrl;
      expect((await cast.clients.visitor.request('GET', url)).status, key).toBe(404);
      expect((await cast.clients.otherHost.request('GET', url)).status, key).toBe(404);
      const own = await cast.clients.viewer.request('GET', url);
      expect(own.status, key).toBe(200);
      expect(own.headers.get('cache-control')).toBe('private, no-store');
      expect((await cast.clients.moderator.request('GET', url)).status, key).toBe(200);
    }
    expect(
      (await cast.clients.viewer.request('GET', skeins.withdrawn.photos[0]!.webUrl)).status,
    ).toBe(404);
  });

  it('one skein has its own address, for public skeins only', async () => {
    const one = (id: string) =>
      cast.clients.visitor.request('GET', at(`/dye-alongs/${month.dyeAlong.id}/gallery/${id}`));
    const res = await one(skeins.approved.id);
    expect(res.status).toBe(200);
    expect(await res.json()).toMatchObject({
      id: skeins.approved.id,
      makerName: 'Vale Viewer',
      baseName: 'Shoreline Sock',
      dyesUsed: ['Brinewell Blue', 'Table vinegar'],
    });
    for (const key of ['waiting', 'rejected', 'needsChanges', 'withdrawn'] as const) {
      expect((await one(skeins[key].id)).status, key).toBe(404);
    }
  });

  it('shows the host’s own colorway beside the community’s: named swatches and its photo', async () => {
    const patched = await cast.clients.host.request('PATCH', at(`/colorways/${month.colorwayId}`), {
      targetSwatches: [{ hex: '#2d6f86', name: 'Pool teal' }],
    });
    expect(patched.status).toBe(200);
    const form = new FormData();
    form.append('purpose', 'colorwayPhoto');
    form.append('colorwayId', month.colorwayId);
    form.append(
      'image',
      new Blob([new Uint8Array(await bandedPng(60, 40))], { type: 'image/png' }),
      'skein.png',
    );
    const uploaded = await cast.clients.host.request('POST', at('/images'), form);
    expect(uploaded.status).toBe(201);
    const photo = (await uploaded.json()) as Image;

    const [colorway] = (await galleryPage()).colorways;
    expect(colorway).toMatchObject({
      name: 'Pool Teal',
      swatches: [{ hex: '#2d6f86', name: 'Pool teal' }],
      photo: { width: photo.width, height: photo.height },
    });
    const thumb = await cast.clients.visitor.request('GET', colorway!.photo!.thumbUrl);
    expect(thumb.status).toBe(200);
    expect(thumb.headers.get('x-content-type-options')).toBe('nosniff');
    // The same route never serves the month's other images (here: the inspiration image).
    const other = colorway!.photo!.thumbUrl.replace(photo.id, month.inspiration.id);
    expect((await cast.clients.visitor.request('GET', other)).status).toBe(404);
  });

  describe('recap running order', () => {
    it('persists, reorders, and keeps each note', async () => {
      const items = [
        { colorwayId: month.colorwayId, note: 'The host’s own skein first.' },
        { submissionId: skeins.featured.id, note: 'Dyed a day late, still lovely.' },
      ];
      const put = await cast.clients.host.request('PUT', recapPath(), { items });
      expect(put.status).toBe(200);
      const saved = (await put.json()) as Recap;
      expect(saved.items.map((i) => [i.kind, i.position, i.note])).toEqual([
        ['colorway', 1, 'The host’s own skein first.'],
        ['skein', 2, 'Dyed a day late, still lovely.'],
      ]);
      expect(saved.candidates.colorways).toEqual([]);

      await cast.clients.host.request('PUT', recapPath(), { items: [items[1], items[0]] });
      const read = (await (
        await cast.clients.moderator.request('GET', recapPath())
      ).json()) as Recap;
      expect(read.items.map((i) => (i.kind === 'skein' ? i.skein.id : i.colorway.id))).toEqual([
        skeins.featured.id,
        month.colorwayId,
      ]);
    });

    it('only featured skeins whose makers agreed may enter; a refusal changes nothing', async () => {
      const before = (await (await cast.clients.host.request('GET', recapPath())).json()) as Recap;
      for (const id of [skeins.approvedOther.id, skeins.waiting.id, month.inspiration.id]) {
        const res = await cast.clients.host.request('PUT', recapPath(), {
          items: [{ submissionId: id }],
        });
        expect(res.status).toBe(400);
      }
      const res = await cast.clients.host.request('PUT', recapPath(), {
        items: [{ colorwayId: month.inspiration.id }],
      });
      expect(res.status).toBe(400);
      const after = (await (await cast.clients.host.request('GET', recapPath())).json()) as Recap;
      expect(after.items).toEqual(before.items);
    });

    it('a maker who withdraws consent leaves the recap at once, but stays in the gallery', async () => {
      const late = await share(cast.clients.viewer, cast, month.dyeAlong.id, {
        details: { consentToFeature: true },
      });
      await decide(late.id, { decision: 'feature' });
      const put = await cast.clients.host.request('PUT', recapPath(), {
        items: [{ submissionId: late.id, note: 'Last one.' }],
      });
      expect(put.status).toBe(200);

      const revoked = await cast.clients.viewer.request(
        'PUT',
        at(`/my-submissions/${late.id}/consent`),
        { consentToFeature: false },
      );
      expect(revoked.status).toBe(200);
      const read = (await (await cast.clients.host.request('GET', recapPath())).json()) as Recap;
      expect(read.items).toEqual([]);
      expect(read.candidates.skeins.map((s) => s.id)).not.toContain(late.id);
      const inGallery = (await galleryPage('limit=100')).items.find((s) => s.id === late.id);
      expect(inGallery).toMatchObject({ featured: false });
      const again = await cast.clients.host.request('PUT', recapPath(), {
        items: [{ submissionId: late.id }],
      });
      expect(again.status).toBe(400);
    });
  });
});
