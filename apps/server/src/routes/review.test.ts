import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type {
  AuditList,
  BulkResult,
  ReviewQueue,
  ReviewSubmission,
} from '@vatside/contracts/review';
import type { Recap } from '@vatside/contracts/gallery';
import type { Submission } from '@vatside/contracts/submissions';
import { eq } from '@vatside/db/sql';
import { reviewMailOutbox, studioMembers } from '@vatside/db/schema';
import type { RunningServer } from '../server.ts';
import { signUpVerified, type TestPerson } from '../test-support/client.ts';
import { waitForMail } from '../test-support/mail-catcher.ts';
import { castStudio, type Cast } from '../test-support/personas.ts';
import { makeSharingMonth, share, type SharingMonth } from '../test-support/sharing-fixtures.ts';
import { startTestServer } from '../test-support/test-server.ts';

describe('review: the queue, decisions, the audit and the sharer’s e-mails', () => {
  let server: RunningServer;
  let cast: Cast;
  let month: SharingMonth;
  let otherMonth: SharingMonth;
  const at = (rest: string) => `/api/studios/${cast.slug}${rest}`;
  const decide = (id: string, body: unknown, who = cast.clients.moderator) =>
    who.request('POST', at(`/review/submissions/${id}/decisions`), body);
  const queue = async (query: string) =>
    (await (
      await cast.clients.moderator.request('GET', at(`/review/submissions?${query}`))
    ).json()) as ReviewQueue;
  const consent = (id: string, consentToFeature: boolean) =>
    cast.clients.viewer.request('PUT', at(`/my-submissions/${id}/consent`), { consentToFeature });
  const audit = async (submissionId: string) =>
    (await (
      await cast.clients.host.request('GET', at(`/review/audit?submissionId=${submissionId}`))
    ).json()) as AuditList;

  beforeAll(async () => {
    // The mail job runs in this server, as in the dye-along mail tests.
    server = await startTestServer({ MAIL_WORKER_ENABLED: 'true' });
    cast = await castStudio(server, 'review');
    month = await makeSharingMonth(cast.clients.host, cast.slug);
    otherMonth = await makeSharingMonth(cast.clients.host, cast.slug);
  });
  afterAll(() => server.close());

  it('the queue: oldest waiting first, filtered by dye-along and status, in pages', async () => {
    const first = await share(cast.clients.viewer, cast, month.dyeAlong.id);
    const second = await share(cast.clients.moderator, cast, month.dyeAlong.id);
    const third = await share(cast.clients.viewer, cast, month.dyeAlong.id);
    const elsewhere = await share(cast.clients.viewer, cast, otherMonth.dyeAlong.id);
    const waiting = await queue(`dyeAlongId=${month.dyeAlong.id}&limit=100`);
    const ids = waiting.items.map((s) => s.id);
    expect(ids.slice(-3)).toEqual([first.id, second.id, third.id]);
    expect(ids).not.toContain(elsewhere.id);
    expect(waiting.items.find((s) => s.id === second.id)?.sharer.name).toBe('Mina Moderator');

    const total = waiting.page.total;
    const pageTwo = await queue(`dyeAlongId=${month.dyeAlong.id}&limit=2&offset=2`);
    expect(pageTwo.items.map((s) => s.id)).toEqual(ids.slice(2, 4));
    expect(pageTwo.page).toEqual({ limit: 2, offset: 2, total });

    expect(
      (await decide(first.id, { decision: 'reject', reason: 'Not a skein from this month.' }))
        .status,
    ).toBe(200);
    const rejected = await queue(`status=rejected&dyeAlongId=${month.dyeAlong.id}`);
    expect(rejected.items.map((s) => s.id)).toEqual([first.id]);
    expect(
      (await queue(`dyeAlongId=${month.dyeAlong.id}&limit=100`)).items.map((s) => s.id),
    ).not.toContain(first.id);
  });

  it('each decision is audited with who and when; a refused one changes nothing', async () => {
    const skein = await share(cast.clients.viewer, cast, month.dyeAlong.id);
    const before = Date.now();
    const res = await decide(skein.id, { decision: 'approve' });
    expect(res.status).toBe(200);
    expect(((await res.json()) as ReviewSubmission).status).toBe('approved');
    const again = await decide(skein.id, { decision: 'approve' });
    expect(again.status).toBe(409);
    const noReason = await decide(skein.id, { decision: 'needsChanges' });
    expect(noReason.status).toBe(400);
    const log = await audit(skein.id);
    expect(log.items).toHaveLength(1);
    expect(log.items[0]).toMatchObject({
      action: 'approve',
      fromStatus: 'waiting',
      toStatus: 'approved',
      actor: { userId: cast.people.moderator.userId, name: 'Mina Moderator' },
      skein: { makerName: 'Vale Viewer', baseName: skein.baseName },
    });
    expect(new Date(log.items[0]!.createdAt).getTime()).toBeGreaterThanOrEqual(before - 1000);
  });

  it('featuring needs the maker’s consent; revoking it unfeatures and leaves the recap', async () => {
    const skein = await share(cast.clients.viewer, cast, month.dyeAlong.id);
    const refused = await decide(skein.id, { decision: 'feature' }, cast.clients.host);
    expect(refused.status).toBe(409);
    expect(await refused.text()).toMatch(/not agreed to be featured/);
    expect((await consent(skein.id, true)).status).toBe(200);
    expect((await decide(skein.id, { decision: 'feature' }, cast.clients.host)).status).toBe(200);
    const recapPath = at(`/dye-alongs/${month.dyeAlong.id}/recap`);
    const put = await cast.clients.host.request('PUT', recapPath, {
      items: [{ submissionId: skein.id, note: 'Look at the speckles.' }],
    });
    expect(put.status).toBe(200);

    const revoked = await consent(skein.id, false);
    expect(((await revoked.json()) as Submission).status).toBe('approved');
    const recap = (await (await cast.clients.host.request('GET', recapPath)).json()) as Recap;
    expect(recap.items).toEqual([]);
    expect(recap.candidates.skeins.map((s) => s.id)).not.toContain(skein.id);
    expect((await audit(skein.id)).items[0]).toMatchObject({
      action: 'unfeature',
      fromStatus: 'featured',
      toStatus: 'approved',
      actor: { name: 'Vale Viewer' },
    });
  });

  it('bulk: each skein checked on its own', async () => {
    const a = await share(cast.clients.viewer, cast, month.dyeAlong.id);
    const b = await share(cast.clients.viewer, cast, month.dyeAlong.id);
    expect((await decide(b.id, { decision: 'reject', reasonTemplate: 'notYarn' })).status).toBe(
      200,
    );
    const stranger = await share(cast.clients.otherHost, cast, month.dyeAlong.id).catch(() => null);
    expect(stranger).toBeNull(); // not a member: cannot share here at all
    const missing = '00000000-0000-4000-8000-000000000000';
    const res = await cast.clients.moderator.request('POST', at('/review/decisions'), {
      submissionIds: [a.id, b.id, missing],
      decision: 'needsChanges',
      reasonTemplate: 'lighting',
    });
    expect(res.status).toBe(200);
    const { results } = (await res.json()) as BulkResult;
    expect(results.map((r) => [r.submissionId, r.ok])).toEqual([
      [a.id, true],
      [b.id, true],
      [missing, false],
    ]);
    expect(results[2]).toMatchObject({ ok: false, error: { code: 'NOT_FOUND' } });
    const noReason = await cast.clients.moderator.request('POST', at('/review/decisions'), {
      submissionIds: [a.id],
      decision: 'reject',
    });
    expect(noReason.status).toBe(400);
  });

  describe('e-mails to the sharer, through the outbox', () => {
    /** Someone new to the studio, so every review mail in their inbox comes from this test. */
    async function newSharer(label: string, name: string): Promise<TestPerson> {
      const person = await signUpVerified(server, label, name);
      await server.deps.database.db
        .insert(studioMembers)
        .values({ studioId: cast.studioId, userId: person.userId, role: 'viewer' });
      return person;
    }
    const consentFor = (person: TestPerson, id: string) =>
      person.client.request('PUT', at(`/my-submissions/${id}/consent`), { consentToFeature: true });

    it('approved, sent back with the reason, and featured each arrive', async () => {
      const sharer = await newSharer('review-mail', 'Skye Sharer');
      const approved = await share(sharer.client, cast, month.dyeAlong.id);
      await decide(approved.id, { decision: 'approve' });
      const mail = await waitForMail(sharer.email, /is in the Tide pool month gallery/);
      expect(mail.text).toMatch(/^Hello Skye Sharer,/);
      expect(mail.text).toMatch(/approved the skein you shared/);
      expect(mail.text).toMatch(/Close to the inspiration/);
      expect(mail.text).toMatch(/Stop review e-mails with one click: http/);
      expect(mail.headers['list-unsubscribe']).toMatch(/\/api\/mail\/review-unsubscribe\?token=/);

      const sentBack = await share(sharer.client, cast, month.dyeAlong.id);
      await decide(sentBack.id, {
        decision: 'needsChanges',
        reason: 'Could you crop out the stove?',
      });
      const note = await waitForMail(sharer.email, /A small change/);
      expect(note.text).toContain('“Could you crop out the stove?”');

      await consentFor(sharer, approved.id);
      await decide(approved.id, { decision: 'feature' }, cast.clients.host);
      await waitForMail(sharer.email, /will be featured in the Tide pool month recap/);
    });

    it('one-click unsubscribe stops the review e-mails that follow', async () => {
      const sharer = await newSharer('review-stop', 'Quinn Quiet');
      const skein = await share(sharer.client, cast, month.dyeAlong.id);
      await decide(skein.id, { decision: 'approve' }, cast.clients.host);
      const mail = await waitForMail(sharer.email, /gallery/);
      const oneClick = new URL(mail.headers['list-unsubscribe']!.slice(1, -1));
      const stop = await fetch(`${server.url}${oneClick.pathname}${oneClick.search}`, {
        method: 'POST',
        headers: { 'content-type': 'application/x-www-form-urlencoded' },
        body: 'List-Unsubscribe=One-Click',
      });
      expect(stop.status).toBe(200);
      expect(await stop.json()).toMatchObject({ reviewMails: false });
      await consentFor(sharer, skein.id);
      await decide(skein.id, { decision: 'feature' }, cast.clients.host);
      const rows = async () =>
        server.deps.database.db
          .select()
          .from(reviewMailOutbox)
          .where(eq(reviewMailOutbox.submissionId, skein.id));
      const deadline = Date.now() + 5000;
      while ((await rows()).some((r) => !r.sentAt && !r.skippedAt) && Date.now() < deadline) {
        await new Promise((r) => setTimeout(r, 100));
      }
      const featured = (await rows()).find((r) => r.kind === 'featured');
      expect(featured).toMatchObject({ sentAt: null, skipReason: 'optedOut' });
    });
  });
});
