import ICAL from 'ical.js';
import pg from 'pg';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { and, eq, isNull, lte, sql } from '@vatside/db/sql';
import { mailOutbox, studioMembers } from '@vatside/db/schema';
import type { RunningServer } from '../server.ts';
import { firstLink } from '../test-support/client.ts';
import {
  addFollowers,
  makeDyeAlong,
  makeMonth,
  type Follower,
} from '../test-support/dye-along-fixtures.ts';
import { waitForMail, type CaughtMail } from '../test-support/mail-catcher.ts';
import { castStudio, type Cast } from '../test-support/personas.ts';
import { startTestServer } from '../test-support/test-server.ts';
import { startMailWorker } from './mail-worker.ts';

const inbox = process.env.MAIL_INBOX_URL ?? 'http://127.0.0.1:4504';
const until = async (check: () => Promise<boolean>, what: string, timeoutMs = 10_000) => {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (await check()) return;
    await new Promise((r) => setTimeout(r, 50));
  }
  throw new Error(`Timed out waiting for ${what}`);
};

/** Every mail the catcher holds for an address whose subject matches. */
async function mailsFor(to: string, subject: RegExp): Promise<CaughtMail[]> {
  const all = (await (await fetch(`${inbox}/email`)).json()) as CaughtMail[];
  return all.filter(
    (m) =>
      m.to.some((r) => r.address.toLowerCase() === to.toLowerCase()) && subject.test(m.subject),
  );
}

async function calendarOf(mail: CaughtMail): Promise<ICAL.Component> {
  const attachment = mail.attachments?.find((a) => a.fileName === 'dye-along.ics') as
    { generatedFileName: string } | undefined;
  expect(attachment).toBeDefined();
  // The catcher stores attachments under a generated name.
  const res = await fetch(`${inbox}/email/${mail.id}/attachment/${attachment!.generatedFileName}`);
  expect(res.status).toBe(200);
  return new ICAL.Component(ICAL.parse(await res.text()) as unknown[]);
}

const ANNOUNCEMENT = /dye-along: /;
const REMINDER = /^Tomorrow: /;

describe('dye-along e-mails through the outbox job', () => {
  /** Plans and announces; its own mail job is off, so each test decides who sends. */
  let server: RunningServer;

  beforeAll(async () => {
    // Several studios are cast here: more sign-ups a minute than the default limit allows.
    server = await startTestServer({ AUTH_ATTEMPTS_PER_MINUTE: '200' });
    // Due mails an interrupted earlier run left behind would be taken first and skew the counts.
    await server.deps.database.db
      .update(mailOutbox)
      .set({ skippedAt: sql`now()`, skipReason: 'stale' })
      .where(
        and(
          isNull(mailOutbox.sentAt),
          isNull(mailOutbox.skippedAt),
          isNull(mailOutbox.failedAt),
          lte(mailOutbox.runAfter, sql`now()`),
        ),
      );
  });
  afterAll(() => server.close());

  async function announcedMonth(label: string, people: Parameters<typeof addFollowers>[2]) {
    const cast: Cast = await castStudio(server, label);
    const month = await makeMonth(cast.clients.host, cast.slug);
    const followers = await addFollowers(server, cast.studioId, people);
    const dyeAlong = await makeDyeAlong(cast.clients.host, cast.slug, {
      startsAtLocal: '2027-02-20T14:00',
      timeZone: 'America/Halifax',
      colorwayIds: [month.colorway.id],
      streamUrl: 'https://stream.example/wrackline',
    });
    const res = await cast.clients.host.request(
      'POST',
      `/api/studios/${cast.slug}/dye-alongs/${dyeAlong.id}/transitions`,
      { to: 'announced' },
    );
    expect(res.status).toBe(200);
    return { cast, followers, dyeAlong };
  }

  const outboxRows = (dyeAlongId: string) =>
    server.deps.database.db.select().from(mailOutbox).where(eq(mailOutbox.dyeAlongId, dyeAlongId));
  const sentCount = async (dyeAlongId: string, kind: 'announcement' | 'reminder') =>
    (await outboxRows(dyeAlongId)).filter((r) => r.kind === kind && r.sentAt).length;
  const makeRemindersDue = (dyeAlongId: string) =>
    server.deps.database.db
      .update(mailOutbox)
      .set({ runAfter: sql`now()` })
      .where(and(eq(mailOutbox.dyeAlongId, dyeAlongId), eq(mailOutbox.kind, 'reminder')));

  it('announces and reminds with the start on each recipient’s clock and a calendar file', async () => {
    const sender = await startTestServer({ MAIL_WORKER_ENABLED: 'true' });
    try {
      const { dyeAlong, followers } = await announcedMonth('mail-zones', [
        { label: 'zone-halifax', timeZone: 'America/Halifax', unitSystem: 'us', grams: 50 },
        { label: 'zone-tokyo', timeZone: 'Asia/Tokyo', unitSystem: 'metric', grams: 100 },
      ]);
      const [halifax, tokyo] = followers as [Follower, Follower];
      // 14:00 Atlantic Standard Time (UTC−4) on 2027-02-20 is 18:00 UTC, which is 03:00 on the
      // 21st in Tokyo (UTC+9, no daylight saving).
      expect(dyeAlong.startsAt).toBe('2027-02-20T18:00:00.000Z');
      const expected = {
        [halifax.email]: {
          zone: 'America/Halifax',
          label: 'Saturday, February 20, 2027 at 2:00 PM',
        },
        [tokyo.email]: { zone: 'Asia/Tokyo', label: 'Sunday, February 21, 2027 at 3:00 AM' },
      };
      for (const person of [halifax, tokyo]) {
        const mail = await waitForMail(person.email, ANNOUNCEMENT);
        const { zone, label } = expected[person.email]!;
        expect(mail.subject).toContain(label);
        expect(mail.text).toContain(`Starts: ${label}`);
        expect(mail.text).toMatch(/safety data sheet/);
        expect(mail.headers['list-unsubscribe']).toMatch(
          /^<http.*\/api\/mail\/unsubscribe\?token=/,
        );
        expect(mail.headers['list-unsubscribe-post']).toBe('List-Unsubscribe=One-Click');

        const vevent = (await calendarOf(mail)).getFirstSubcomponent('vevent')!;
        const start = new ICAL.Event(vevent).startDate.toJSDate();
        expect(start.toISOString()).toBe(dyeAlong.startsAt);
        // The calendar's instant on the recipient's clock reads as the mail says.
        const shown = new Intl.DateTimeFormat('en-US', {
          timeZone: zone,
          weekday: 'long',
          month: 'long',
          day: 'numeric',
          year: 'numeric',
          hour: 'numeric',
          minute: '2-digit',
        }).format(start);
        expect(shown).toBe(label);
        const alarm = vevent.getFirstSubcomponent('valarm')!;
        expect(alarm.getFirstPropertyValue('action')).toBe('DISPLAY');
        expect((alarm.getFirstPropertyValue('trigger') as ICAL.Duration).toSeconds()).toBe(-3600);
      }
      // Amounts for each person's own skein and units: 1 % depth of shade from a 1 % stock.
      expect((await waitForMail(halifax.email, ANNOUNCEMENT)).text).toMatch(
        /one 50 g skein of each colorway \(US measures\)[\s\S]*Brinewell Blue, 1 % stock: 50 mL \(/,
      );
      expect((await waitForMail(tokyo.email, ANNOUNCEMENT)).text).toMatch(
        /one 100 g skein of each colorway \(metric measures\)[\s\S]*Brinewell Blue, 1 % stock: 100 mL/,
      );

      // The day before (brought forward here): the prep checklist.
      expect(await sentCount(dyeAlong.id, 'reminder')).toBe(0);
      await makeRemindersDue(dyeAlong.id);
      for (const person of [halifax, tokyo]) {
        const reminder = await waitForMail(person.email, REMINDER);
        expect(reminder.text).toMatch(
          /The day before[\s\S]*Tie each skein loosely in figure-eights/,
        );
        expect(reminder.text).toMatch(/Mix Brinewell Blue stock at 1 %/);
        expect(reminder.text).toMatch(/An hour before[\s\S]*Soak the yarn/);
        expect(reminder.headers['list-unsubscribe-post']).toBe('List-Unsubscribe=One-Click');
        const vevent = (await calendarOf(reminder)).getFirstSubcomponent('vevent')!;
        expect(new ICAL.Event(vevent).startDate.toJSDate().toISOString()).toBe(dyeAlong.startsAt);
      }
    } finally {
      await sender.close();
    }
  });

  it('never sends twice: a worker stopped mid-way and one that dies holding a row', async () => {
    const people = Array.from({ length: 6 }, (_, i) => ({
      label: `restart-${i}`,
      timeZone: 'UTC',
    }));
    const { dyeAlong, followers } = await announcedMonth('mail-restart', people);

    // First process: sends two, then shuts down cleanly.
    const first = await startTestServer();
    const worker = startMailWorker(first.deps, {
      pollMs: 50,
      batchSize: 2,
      retryBaseMs: 1000,
      maxAttempts: 3,
      autoStart: false,
    });
    expect(await worker.runOnce()).toBe(2);
    await worker.stop();
    await first.close();
    expect(await sentCount(dyeAlong.id, 'announcement')).toBe(2);

    // A second worker claims a row and "dies" mid-send: its transaction never commits.
    const crashed = new pg.Client({ connectionString: process.env.DATABASE_URL });
    await crashed.connect();
    await crashed.query('begin');
    const held = await crashed.query<{ id: string }>(
      `select id from mail_outbox where dye_along_id = $1 and kind = 'announcement' and sent_at is null
       order by run_after limit 1 for update skip locked`,
      [dyeAlong.id],
    );
    expect(held.rows).toHaveLength(1);

    // A fresh server starts: it sends the rest but not the row still held.
    const second = await startTestServer({ MAIL_WORKER_ENABLED: 'true' });
    try {
      await until(async () => (await sentCount(dyeAlong.id, 'announcement')) === 5, 'five sent');
      await new Promise((r) => setTimeout(r, 300)); // several more polls
      const heldRow = (await outboxRows(dyeAlong.id)).find((r) => r.id === held.rows[0]!.id);
      expect(heldRow?.sentAt).toBeNull();
      await crashed.end(); // the connection drops, its transaction rolls back
      await until(async () => (await sentCount(dyeAlong.id, 'announcement')) === 6, 'six sent');
    } finally {
      await second.close();
    }
    for (const person of followers) {
      expect(await mailsFor(person.email, ANNOUNCEMENT), person.email).toHaveLength(1);
    }
    const rows = (await outboxRows(dyeAlong.id)).filter((r) => r.kind === 'announcement');
    expect(rows.every((r) => r.attempts === 1)).toBe(true);
  });

  it('back to draft withdraws the queued mails; announcing again sends each once', async () => {
    const { cast, dyeAlong, followers } = await announcedMonth('mail-withdraw', [
      { label: 'withdraw', timeZone: 'UTC' },
    ]);
    const move = (to: string) =>
      cast.clients.host.request(
        'POST',
        `/api/studios/${cast.slug}/dye-alongs/${dyeAlong.id}/transitions`,
        { to },
      );
    expect((await move('draft')).status).toBe(200);
    expect((await outboxRows(dyeAlong.id)).map((r) => r.skipReason)).toEqual([
      'withdrawn',
      'withdrawn',
    ]);
    expect((await move('announced')).status).toBe(200);
    const worker = startMailWorker(server.deps, {
      pollMs: 50,
      batchSize: 10,
      retryBaseMs: 1000,
      maxAttempts: 3,
      autoStart: false,
    });
    expect(await worker.runOnce()).toBe(1); // the announcement; the reminder waits for its day
    expect(await worker.runOnce()).toBe(0);
    await worker.stop();
    // Withdrawn and announced again before anything went out: one announcement, not two.
    expect((await move('draft')).status).toBe(200);
    expect((await move('announced')).status).toBe(200);
    const again = startMailWorker(server.deps, {
      pollMs: 50,
      batchSize: 10,
      retryBaseMs: 1000,
      maxAttempts: 3,
      autoStart: false,
    });
    expect(await again.runOnce()).toBe(0);
    await again.stop();
    expect(await mailsFor(followers[0]!.email, ANNOUNCEMENT)).toHaveLength(1);
  });

  it('two servers running the job at once still send each mail once', async () => {
    const people = Array.from({ length: 8 }, (_, i) => ({ label: `pair-${i}`, timeZone: 'UTC' }));
    const a = await startTestServer({ MAIL_WORKER_ENABLED: 'true', MAIL_WORKER_BATCH: '1' });
    const b = await startTestServer({ MAIL_WORKER_ENABLED: 'true', MAIL_WORKER_BATCH: '1' });
    try {
      const { dyeAlong, followers } = await announcedMonth('mail-pair', people);
      await until(async () => (await sentCount(dyeAlong.id, 'announcement')) === 8, 'eight sent');
      await new Promise((r) => setTimeout(r, 200));
      for (const person of followers) {
        expect(await mailsFor(person.email, ANNOUNCEMENT), person.email).toHaveLength(1);
      }
    } finally {
      await Promise.all([a.close(), b.close()]);
    }
  });

  it('backs off when the mail server is down, and sends once when it is back', async () => {
    const { dyeAlong, followers } = await announcedMonth('mail-retry', [
      { label: 'retry', timeZone: 'UTC' },
    ]);
    const down = await startTestServer({
      MAIL_WORKER_ENABLED: 'true',
      SMTP_URL: 'smtp://127.0.0.1:9',
      MAIL_RETRY_BASE_MS: '300',
    });
    let failedOnce;
    try {
      await until(
        async () => (await outboxRows(dyeAlong.id)).some((r) => r.attempts === 1 && r.lastError),
        'a failed attempt',
      );
      failedOnce = (await outboxRows(dyeAlong.id)).find((r) => r.kind === 'announcement')!;
    } finally {
      await down.close();
    }
    expect(failedOnce.sentAt).toBeNull();
    expect(failedOnce.runAfter.getTime()).toBeGreaterThan(failedOnce.createdAt.getTime());
    const up = await startTestServer({ MAIL_WORKER_ENABLED: 'true' });
    try {
      await waitForMail(followers[0]!.email, ANNOUNCEMENT);
      const row = (await outboxRows(dyeAlong.id)).find((r) => r.kind === 'announcement')!;
      expect(row.attempts).toBe(2);
      expect(row.sentAt).not.toBeNull();
      expect(await mailsFor(followers[0]!.email, ANNOUNCEMENT)).toHaveLength(1);
    } finally {
      await up.close();
    }
  });

  it('one click unsubscribes at once; the job re-checks the opt-in before each send', async () => {
    const sender = await startTestServer({ MAIL_WORKER_ENABLED: 'true' });
    try {
      const { cast, dyeAlong, followers } = await announcedMonth('mail-unsub', [
        { label: 'unsub-clicks', timeZone: 'UTC' },
        { label: 'unsub-unfollows', timeZone: 'UTC' },
        { label: 'unsub-stays', timeZone: 'UTC' },
      ]);
      const [clicks, unfollows, stays] = followers as [Follower, Follower, Follower];
      const mail = await waitForMail(clicks.email, ANNOUNCEMENT);
      const oneClick = /^<(.+)>$/.exec(mail.headers['list-unsubscribe'] ?? '')?.[1];
      expect(oneClick).toBeDefined();
      const pageLink = firstLink(mail.text?.slice(mail.text.indexOf('Stop them with one click')));
      expect(new URL(pageLink).pathname).toBe('/unsubscribe');
      const optIn = async (who: Follower) =>
        (
          await server.deps.database.db
            .select({ on: studioMembers.mailOptIn })
            .from(studioMembers)
            .where(
              and(eq(studioMembers.studioId, cast.studioId), eq(studioMembers.userId, who.userId)),
            )
        )[0]?.on;

      // A GET (what link scanners do) only describes; the one-click POST unsubscribes.
      const looked = await fetch(oneClick!.replace(/^http:\/\/[^/]+/, server.url));
      expect(await looked.json()).toMatchObject({ studio: { slug: cast.slug }, mailOptIn: true });
      const forged = await fetch(
        `${server.url}/api/mail/unsubscribe?token=${new URL(oneClick!).searchParams.get('token')!.slice(0, -2)}xx`,
        { method: 'POST' },
      );
      expect(forged.status).toBe(400);
      expect(await optIn(clicks)).toBe(true);
      const clicked = await fetch(oneClick!.replace(/^http:\/\/[^/]+/, server.url), {
        method: 'POST',
        headers: { 'content-type': 'application/x-www-form-urlencoded' },
        body: 'List-Unsubscribe=One-Click',
      });
      expect(clicked.status).toBe(200);
      expect(await clicked.json()).toMatchObject({ mailOptIn: false });
      expect(await optIn(clicks)).toBe(false);

      // Someone else turns the e-mails off elsewhere (not through the link).
      await waitForMail(unfollows.email, ANNOUNCEMENT);
      await server.deps.database.db
        .update(studioMembers)
        .set({ mailOptIn: false })
        .where(eq(studioMembers.userId, unfollows.userId));

      await makeRemindersDue(dyeAlong.id);
      await waitForMail(stays.email, REMINDER);
      await until(
        async () => (await outboxRows(dyeAlong.id)).every((r) => r.sentAt || r.skippedAt),
        'every row settled',
      );
      for (const who of [clicks, unfollows]) {
        expect(await mailsFor(who.email, REMINDER), who.email).toHaveLength(0);
        const row = (await outboxRows(dyeAlong.id)).find(
          (r) => r.kind === 'reminder' && r.recipientUserId === who.userId,
        );
        expect(row?.skipReason).toBe('optedOut');
      }
    } finally {
      await sender.close();
    }
  });
});
