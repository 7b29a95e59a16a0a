import { randomUUID } from 'node:crypto';
import { mkdirSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ApiPerson, created, waitForMail } from '../support/api.ts';
import {
  appOrigin,
  launchBrowser,
  newContext,
  saveScreenshot,
  signInThroughForm,
  watchPage,
} from '../support/browser.ts';

// Step 2 of the month: the host plans and announces in the console; a follower is e-mailed; a
// visitor on a phone in another time zone reads the page for a 50 g skein in US measures; the
// recipe card prints to PDF; the e-mail's unsubscribe link works.

let browser: Browser;
let host: ApiPerson;
let follower: ApiPerson;
const slug = `e2e-announce-${randomUUID().slice(0, 8)}`;
const studioName = 'Wrackline Test Dyeworks';
const title = 'Tide pool month';
const hostZone = 'America/Halifax';
const viewerZone = 'Asia/Tokyo';
const api = (rest: string) => `/api/studios/${slug}${rest}`;

/** A day ten days on, as the host's wall clock reads it, at 2 PM. */
function startInTenDays(): string {
  const day = new Intl.DateTimeFormat('en-CA', {
    timeZone: hostZone,
    year: 'numeric',
    month: '2-digit',
    day: '2-digit',
  }).format(new Date(Date.now() + 10 * 86_400_000));
  return `${day}T14:00`;
}

/** Intl's reading of an instant on a clock (independent of the app's date-fns code). */
function onClock(iso: string, timeZone: string) {
  const date = new Date(iso);
  const day = new Intl.DateTimeFormat('en-US', {
    timeZone,
    weekday: 'long',
    month: 'long',
    day: 'numeric',
    year: 'numeric',
  }).format(date);
  const time = new Intl.DateTimeFormat('en-US', { timeZone, hour: 'numeric', minute: '2-digit' })
    .format(date)
    .replace(/\s/g, ' ');
  return { day, time };
}

beforeAll(async () => {
  browser = await launchBrowser();
  [host, follower] = await Promise.all([
    ApiPerson.signUp('e2e-announce-host', 'Isolde Wrackline'),
    ApiPerson.signUp('e2e-announce-follower', 'Pim Shellgrove'),
  ]);
  expect(
    (await host.call('POST', '/api/studios', { name: studioName, slug, accentHex: '#1f6f78' }))
      .status,
  ).toBe(201);
  expect(
    (await follower.call('PUT', `/api/studios/${slug}/follow`, { mailOptIn: true })).status,
  ).toBe(200);

  // The month's workbench, as in the server's dye-along fixtures.
  const post = <T>(rest: string, body: unknown) =>
    host.call('POST', api(rest), body).then((r) => created<T>(r));
  const base = await post<{ id: string }>('/bases', {
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
  const dye = await post<{ id: string }>('/dyes', {
    kind: 'acidDyePowder',
    name: 'Brinewell Blue',
    swatchHex: '#1f6f78',
  });
  const jar = await post<{ id: string }>('/stock-solutions', {
    dyeId: dye.id,
    stockStrengthPct: 1,
    volumeMadeMl: 500,
    madeOn: '2026-01-20',
  });
  const colorway = await post<{ id: string; recipeLines: { id: string }[] }>('/colorways', {
    name: 'Pool Teal',
    technique: 'immersion',
    baseId: base.id,
    skeinCount: 2,
    recipeLines: [{ kind: 'stock', stockSolutionId: jar.id, depthOfShadePct: 1 }],
    targetSwatches: [{ hex: '#1f6f78', name: 'Deep pool' }],
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
});

afterAll(() => browser?.close());

let dyeAlongId = '';
let startsAt = '';

describe('the host plans and announces a dye-along (desktop)', () => {
  it('creates it with a start on the host’s clock, announces it, and the follower is e-mailed', async () => {
    const context = await newContext(browser, 'desktop', hostZone);
    const page = await context.newPage();
    const problems = watchPage(page);
    await signInThroughForm(page, host, 'console', `/studios/${slug}/dye-alongs/new`);

    await page.getByLabel('Title').fill(title);
    await page.getByLabel('Stream link').fill('https://stream.example.test/wrackline');
    await page.getByLabel('Starts at (on your clock)').fill(startInTenDays());
    await page.getByLabel('Time zone', { exact: true }).selectOption(hostZone);
    await page.getByLabel('Pool Teal').check();
    await page.getByRole('button', { name: 'Add a prep item' }).click();
    await page.getByLabel('Prep item 1').fill('Wind the skeins into loose hanks.');
    await saveScreenshot(page, 'announce-console-plan');
    await page.getByRole('button', { name: 'Save as draft' }).click();

    await page.getByRole('heading', { name: title, level: 2 }).waitFor();
    dyeAlongId = page.url().split('/').at(-1) ?? '';
    await page.getByRole('button', { name: 'Announce and e-mail followers' }).click();
    await page.getByRole('button', { name: 'Yes, announce and send the e-mails' }).click();
    await page.getByText('Its page is public and followers have been told.').waitFor();

    const mail = await waitForMail(follower.email, new RegExp(`dye-along: ${title}`), 30_000);
    expect(mail.text).toContain('Brinewell Blue');
    // The counts on the screen catch up by themselves.
    await page.getByText(/[1-9]\d* sent/).waitFor({ timeout: 20_000 });
    await saveScreenshot(page, 'announce-console-detail');

    const detail = (await (await host.call('GET', api(`/dye-alongs/${dyeAlongId}`))).json()) as {
      status: string;
      startsAt: string;
      startsAtHost: { local: string };
    };
    expect(detail.status).toBe('announced');
    expect(detail.startsAtHost.local).toBe(startInTenDays());
    startsAt = detail.startsAt;

    // The month's list shows it with its status in words.
    await page.goto(
      `${appOrigin}/console/studios/${slug}/dye-alongs?month=${startInTenDays().slice(0, 7)}`,
    );
    const row = page.getByRole('listitem').filter({ hasText: title });
    await expect.poll(() => row.textContent()).toContain('Announced');
    await saveScreenshot(page, 'announce-console-month');
    expect(problems).toEqual([]);
    await context.close();
  });

  it('prints the recipe card to PDF', async () => {
    const context = await newContext(browser, 'desktop', hostZone);
    const page = await context.newPage();
    const problems = watchPage(page);
    await signInThroughForm(page, host, 'console', `/studios/${slug}/dye-alongs/${dyeAlongId}`);
    await page.getByRole('link', { name: 'Recipe card: Pool Teal' }).click();

    const card = page.getByRole('article', { name: 'Pool Teal' });
    await card.waitFor();
    await expect
      .poll(() => card.getByRole('columnheader', { name: '50 g (1.76 oz)' }).count())
      .toBe(1);
    await page.getByLabel('Paper').selectOption('a4');
    expect(await card.getAttribute('class')).toContain('vs-paper-a4');
    await saveScreenshot(page, 'announce-recipe-card');

    const pdf = await page.pdf({ preferCSSPageSize: true, printBackground: true });
    expect(pdf.subarray(0, 4).toString('latin1')).toBe('%PDF');
    const pages = pdf.toString('latin1').match(/\/Type\s*\/Page\b/g) ?? [];
    expect(pages.length).toBeGreaterThanOrEqual(1);
    const resultsDir = process.env.VATSIDE_TEST_RESULTS ?? path.resolve('.local/test/results');
    mkdirSync(resultsDir, { recursive: true });
    writeFileSync(path.join(resultsDir, 'announce-recipe-card.pdf'), pdf);

    await page.emulateMedia({ media: 'print' });
    await saveScreenshot(page, 'announce-recipe-card-print');
    expect(problems).toEqual([]);
    await context.close();
  });
});

describe('a visitor on a phone in another time zone reads the page', () => {
  it('shows the start on the phone’s clock and amounts for a 50 g skein in US measures', async () => {
    const context = await newContext(browser, 'phone', viewerZone);
    const page = await context.newPage();
    const problems = watchPage(page);
    await page.goto(`${appOrigin}/s/${slug}`);
    const next = page.getByRole('link', { name: 'See what to get ready' });
    await next.waitFor();
    await saveScreenshot(page, 'announce-viewer-studio-phone');
    await next.click();
    await page.getByRole('heading', { name: title, level: 1 }).waitFor();

    const expected = onClock(startsAt, viewerZone);
    const start = page.getByRole('region', { name: 'Starts on your clock' });
    await expect.poll(() => start.textContent()).toContain(expected.day);
    expect(await start.textContent()).toContain(expected.time);
    expect(await start.textContent()).toContain(`Your time zone: ${viewerZone}`);

    await page.getByRole('button', { name: '50 g', exact: true }).click();
    expect(
      await page.getByRole('button', { name: 'US measures' }).getAttribute('aria-pressed'),
    ).toBe('true');
    await page.getByText('1 × 50 g (1.76 oz)').waitFor();
    // 1 % depth of shade from a 1 % stock: 50 mL for 50 g, in US spoons 3 tbsp + 1 ⅛ tsp.
    const stock = page.getByRole('listitem').filter({ hasText: 'Brinewell Blue, 1 % stock' });
    await expect.poll(() => stock.textContent()).toContain('3 tbsp + 1 ⅛ tsp');
    expect(await stock.textContent()).toContain('50 mL');
    await saveScreenshot(page, 'announce-viewer-phone');
    expect(problems).toEqual([]);
    await context.close();
  });

  it('stops the studio’s e-mails from the link in the announcement', async () => {
    const mail = await waitForMail(follower.email, new RegExp(`dye-along: ${title}`));
    const link = mail.text?.match(/https?:\/\/\S+\/unsubscribe\?token=[\w.-]+/)?.[0];
    expect(link).toBeDefined();
    const context = await newContext(browser, 'phone', viewerZone);
    const page = await context.newPage();
    const problems = watchPage(page);
    await page.goto(link!);
    await page.getByRole('button', { name: 'Stop these e-mails' }).click();
    await page.getByRole('heading', { name: 'Done: no more e-mails' }).waitFor();
    await saveScreenshot(page, 'announce-unsubscribe-phone');

    const res = await host.call('GET', `/api/studios/${slug}/members`);
    const { members } = (await res.json()) as {
      members: { userId: string; mailOptIn: boolean }[];
    };
    expect(members.find((m) => m.userId === follower.userId)?.mailOptIn).toBe(false);
    expect(problems).toEqual([]);
    await context.close();
  });
});
