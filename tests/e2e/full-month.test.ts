import { randomUUID } from 'node:crypto';
import type { Browser, BrowserContext, Page } from 'playwright-core';
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
import { drawSkeinJpeg, encodePng } from '../support/images.ts';

// One whole month in the browser against the real services, in the order the host lives it:
// plan → announce → go live → share → review → recap → archive → dye again. Each stage saves a
// screenshot named month-<n>-<stage> beside the other test artefacts. The stages share state
// and run in order; a failure stops the month where it broke.

let browser: Browser;
let host: ApiPerson;
let moderator: ApiPerson;
let pim: ApiPerson;
let ada: ApiPerson;
const slug = `month-${randomUUID().slice(0, 8)}`;
const studioName = 'Saltgrass Test Dyeworks';
const title = 'Rock pool month';
const hostZone = 'America/Halifax';
const api = (rest: string) => `/api/studios/${slug}${rest}`;
/** Each page's running list of console errors and off-loopback requests (watchPage). */
const pageProblems: string[][] = [];
let dyeAlongId = '';

const poolWaterHex = '#1f7a8c';

/** An invented rock pool: teal water over sand, with a coral band. */
const rockPool = encodePng(120, 80, (x, y) =>
  y < 40 ? [31, 122, 140] : x < 80 ? [217, 201, 163] : [224, 106, 78],
);

/** A page in a fresh context, signed in through the app's own form when `person` is given. */
async function openAs(
  person: ApiPerson | null,
  viewport: 'phone' | 'desktop',
  app: 'console' | 'viewer',
  next: string,
  options: { timezoneId?: string; context?: BrowserContext } = {},
): Promise<Page> {
  const context = options.context ?? (await newContext(browser, viewport, options.timezoneId));
  const page = await context.newPage();
  pageProblems.push(watchPage(page));
  if (person) await signInThroughForm(page, person, app, next);
  else await page.goto(`${app === 'console' ? `${appOrigin}/console` : appOrigin}${next}`);
  return page;
}

/** A time an hour on, as the host's wall clock reads it (the form takes local time). */
function inAnHourOnHostClock(): string {
  const parts = new Intl.DateTimeFormat('en-CA', {
    timeZone: hostZone,
    year: 'numeric',
    month: '2-digit',
    day: '2-digit',
    hour: '2-digit',
    minute: '2-digit',
    hourCycle: 'h23',
  }).formatToParts(new Date(Date.now() + 60 * 60_000));
  const get = (type: string) => parts.find((p) => p.type === type)?.value ?? '';
  return `${get('year')}-${get('month')}-${get('day')}T${get('hour')}:${get('minute')}`;
}

beforeAll(async () => {
  browser = await launchBrowser();
  [host, moderator, pim, ada] = await Promise.all([
    ApiPerson.signUp('month-host', 'Isolde Saltgrass'),
    ApiPerson.signUp('month-moderator', 'Corra Weedline'),
    ApiPerson.signUp('month-pim', 'Pim Shellgrove'),
    ApiPerson.signUp('month-ada', 'Ada Kelpie'),
  ]);
});

afterAll(() => browser?.close());

describe('a whole month, start to finish', () => {
  it('1 · plan: a studio, its shelf, an inspiration image and two colorways', async () => {
    const page = await openAs(host, 'desktop', 'console', '/studios/new', {
      timezoneId: hostZone,
    });
    await page.getByLabel('Studio name').fill(studioName);
    await page.getByLabel('Web address').fill(slug);
    await page.getByRole('button', { name: /start the studio/i }).click();
    await page.waitForURL(new RegExp(`/console/studios/${slug}`));

    // The shelf and the base come through the API: the workbench test drives those screens.
    await created(
      await host.call('POST', api('/bases'), {
        name: 'Shoreline Sock',
        fiberContent: [
          { fiber: 'wool', pct: 75 },
          { fiber: 'nylon', pct: 25 },
        ],
        superwash: true,
        weightClass: 1,
        skeinWeightG: 100,
        skeinLengthM: 400,
      }),
    );
    const dye = await created<{ id: string }>(
      await host.call('POST', api('/dyes'), {
        kind: 'acidDyePowder',
        name: 'Brinewell Blue',
        swatchHex: '#1f6f78',
      }),
    );
    await created(
      await host.call('POST', api('/stock-solutions'), {
        dyeId: dye.id,
        stockStrengthPct: 1,
        volumeMadeMl: 1000,
        madeOn: '2026-11-20',
      }),
    );
    await created(
      await host.call('POST', api('/pots'), {
        name: 'Big enamel pot',
        capacityMl: 12_000,
        material: 'enamel',
      }),
    );

    // The inspiration image and its palette, in the console.
    await page.goto(`${appOrigin}/console/studios/${slug}/inspiration`);
    await page.getByLabel('Image file').setInputFiles({
      name: 'rock-pool.png',
      mimeType: 'image/png',
      buffer: rockPool,
    });
    await page.getByRole('button', { name: 'Upload and find its palette' }).click();
    await page.getByRole('article', { name: 'Inspiration image 1' }).waitFor();

    // Two colorways with a recipe line and a short timed step each.
    for (const [name, depth] of [
      ['Pool Teal', '1'],
      ['Sand Shallows', '0.25'],
    ] as const) {
      await page.goto(`${appOrigin}/console/studios/${slug}/colorways`);
      const start = page.getByRole('form', { name: 'Start a colorway' });
      await start.getByLabel('Colorway name').fill(name);
      await start.getByLabel('Base').selectOption({ label: 'Shoreline Sock' });
      await start.getByRole('button', { name: 'Start colorway' }).click();
      const recipe = page.getByRole('form', { name: 'Colorway recipe' });
      await recipe.getByRole('button', { name: 'Add a stock solution line' }).click();
      const line = recipe.getByRole('group', { name: 'Line 1' });
      await line.getByLabel('Stock solution').selectOption({ index: 1 });
      await line.getByLabel('Depth of shade').fill(depth);
      await recipe.getByRole('button', { name: 'Save recipe' }).click();
      await page.getByRole('region', { name: 'Amounts' }).getByRole('row').nth(1).waitFor();
      const stepForm = page.getByRole('form', { name: 'Add a step' });
      await stepForm.getByLabel('What to do').fill('Pour in the stock and stir gently');
      await stepForm.getByLabel('Amount to measure (optional)').selectOption({ index: 1 });
      await stepForm.getByLabel('Timer (optional)').fill('0:20');
      await stepForm.getByLabel('Caution').selectOption('hotBath');
      await stepForm.getByRole('button', { name: 'Add step' }).click();
      await page.getByRole('list', { name: 'Run sheet' }).getByText('Pour in the stock').waitFor();
    }
    // The teal of the rock pool as the colorway's target, so the archive can find it by color.
    const listed = (await (await host.call('GET', api('/colorways'))).json()) as {
      items: { id: string; name: string }[];
    };
    const poolTeal = listed.items.find((c) => c.name === 'Pool Teal')!;
    const patched = await host.call('PATCH', api(`/colorways/${poolTeal.id}`), {
      targetSwatches: [{ hex: poolWaterHex, name: 'Pool water' }],
    });
    expect(patched.status).toBe(200);
    await saveScreenshot(page, 'month-1-plan');
    await page.context().close();
  }, 180_000);

  it('2 · announce: followers are e-mailed and the calendar file reads right', async () => {
    for (const viewer of [pim, ada]) {
      const res = await viewer.call('PUT', api('/follow'), { mailOptIn: true });
      expect(res.status).toBe(200);
    }
    const page = await openAs(host, 'desktop', 'console', `/studios/${slug}/dye-alongs/new`, {
      timezoneId: hostZone,
    });
    await page.getByLabel('Title').fill(title);
    await page.getByLabel('Starts at (on your clock)').fill(inAnHourOnHostClock());
    await page.getByLabel('Time zone', { exact: true }).selectOption(hostZone);
    await page.getByLabel('Pool Teal').check();
    await page.getByLabel('Sand Shallows').check();
    await page
      .getByRole('group', { name: 'Inspiration image' })
      .getByLabel(/Image 1/)
      .check();
    await page.getByRole('button', { name: 'Save as draft' }).click();
    await page.getByRole('heading', { name: title, level: 2 }).waitFor();
    dyeAlongId = page.url().split('/').at(-1) ?? '';
    await page.getByRole('button', { name: 'Announce and e-mail followers' }).click();
    await page.getByRole('button', { name: 'Yes, announce and send the e-mails' }).click();
    await page.getByText('Its page is public and followers have been told.').waitFor();
    await saveScreenshot(page, 'month-2-announce');

    const mail = await waitForMail(pim.email, new RegExp(`dye-along: ${title}`), 30_000);
    expect(mail.text).toContain('Brinewell Blue');
    // RFC 5545: a VEVENT with the title as SUMMARY and the start in UTC.
    const ics = await (await pim.call('GET', api(`/dye-alongs/${dyeAlongId}/calendar.ics`))).text();
    expect(ics).toMatch(/^BEGIN:VCALENDAR/);
    expect(ics).toContain('BEGIN:VEVENT');
    expect(ics).toContain(`SUMMARY:${title}`);
    expect(ics).toMatch(/DTSTART:\d{8}T\d{6}Z/);
    await page.context().close();
  }, 120_000);

  it('3 · go live: two phones follow, one with a wrong clock, one that drops off', async () => {
    const board = await openAs(host, 'desktop', 'console', `/studios/${slug}/live`);
    const month = board.getByRole('article', { name: title });
    await month.getByRole('button', { name: 'Go live' }).click();
    const pot = (n: number) => board.getByRole('region', { name: new RegExp(`^Pot ${n} ·`) });
    await pot(1).waitFor();
    const viewerLink = await board
      .getByRole('region', { name: 'Follow-along link' })
      .getByText(`${appOrigin}/live/`)
      .textContent();

    // Pim's phone runs seven minutes slow; only the server's clock keeps the timer right.
    const slowContext = await newContext(browser, 'phone');
    await slowContext.clock.install({ time: Date.now() - 7 * 60_000 });
    const slow = await openAs(pim, 'phone', 'viewer', new URL(viewerLink!).pathname, {
      context: slowContext,
    });
    const flaky = await openAs(ada, 'phone', 'viewer', new URL(viewerLink!).pathname);
    for (const phone of [slow, flaky]) {
      await phone
        .getByRole('region', { name: 'Pool Teal' })
        .getByText('Pour in the stock')
        .waitFor();
    }

    await pot(1).getByRole('button', { name: 'Start timer' }).click();
    const timer = slow.getByRole('timer', { name: 'Pool Teal timer' });
    const shownSeconds = async () => {
      const [m = '0', sec = '0'] = (
        (await timer.textContent())?.match(/\d+:\d\d/)?.[0] ?? ''
      ).split(':');
      return Number(m) * 60 + Number(sec);
    };
    await expect.poll(shownSeconds, { timeout: 15_000 }).toBeLessThanOrEqual(20);
    await expect.poll(shownSeconds, { timeout: 15_000 }).toBeGreaterThan(5);
    await saveScreenshot(slow, 'month-3-live-phone');

    // Ada drops off; the host pauses meanwhile; she comes back to the paused timer.
    await flaky.context().setOffline(true);
    await flaky.getByText('Offline — reconnecting…').waitFor({ timeout: 50_000 });
    await pot(1).getByRole('button', { name: 'Pause timer' }).click();
    await pot(1).getByText('Paused').waitFor();
    await flaky.context().setOffline(false);
    await flaky.getByRole('region', { name: 'Pool Teal' }).getByText('Paused').waitFor({
      timeout: 20_000,
    });

    // What actually went in: a little more teal than planned, the sand as planned.
    const teal = board.getByRole('region', { name: 'Dye log · Pool Teal' });
    await teal.getByRole('button', { name: /^Adjust / }).click();
    await teal.getByLabel(/^Amount of .* that went in \(mL\)$/).fill('110');
    await teal.getByRole('button', { name: 'Log', exact: true }).click();
    await teal.getByRole('list', { name: 'Logged for Pool Teal' }).getByText('adjusted').waitFor();
    const sand = board.getByRole('region', { name: 'Dye log · Sand Shallows' });
    await sand.getByRole('button', { name: /^Log as planned/ }).click();
    await sand
      .getByRole('list', { name: 'Logged for Sand Shallows' })
      .getByText('as planned')
      .waitFor();
    await saveScreenshot(board, 'month-3-live-board');

    await board.getByRole('button', { name: 'End the live session…' }).click();
    await board.getByRole('button', { name: 'Yes, end the live session' }).click();
    await slow.getByText(/ended/i).first().waitFor({ timeout: 20_000 });
    for (const page of [board, slow, flaky]) await page.context().close();
  }, 180_000);

  it('4 · share: the host opens sharing; two phones share their skeins', async () => {
    const desk = await openAs(
      host,
      'desktop',
      'console',
      `/studios/${slug}/dye-alongs/${dyeAlongId}`,
    );
    await desk.getByRole('button', { name: 'Open skein sharing' }).click();
    await desk.getByRole('button', { name: 'Open skein sharing' }).waitFor({ state: 'detached' });
    await desk.context().close();

    for (const [person, yarnHex, consent] of [
      [pim, poolWaterHex, true],
      [ada, '#b0487a', false],
    ] as const) {
      const phone = await openAs(person, 'phone', 'viewer', `/s/${slug}/dye-alongs/${dyeAlongId}`);
      await phone.getByRole('link', { name: 'Share your skein' }).click();
      await phone.getByRole('heading', { name: 'Share your skein', level: 1 }).waitFor();
      await phone.getByLabel('Choose from photos').setInputFiles({
        name: 'skein.jpg',
        mimeType: 'image/jpeg',
        buffer: await drawSkeinJpeg(phone, yarnHex),
      });
      await phone.getByRole('group', { name: /Yarn area on Photo 1/ }).waitFor();
      await phone.getByLabel('Which colorway inspired it?').selectOption({ label: 'Pool Teal' });
      await phone.getByLabel('Yarn base').fill('Shoreline Sock');
      await phone.getByLabel('Main fiber').selectOption('wool');
      await phone.getByLabel('Dyes used').fill('Brinewell Blue, vinegar');
      if (consent) {
        // The switch is drawn over its label, which takes the tap as a finger would.
        await phone.getByText('The host may feature it in the recap').click();
        expect(
          await phone.getByRole('switch', { name: /feature it in the recap/ }).isChecked(),
        ).toBe(true);
      }
      await phone.getByRole('button', { name: 'Share my skein' }).click();
      const shared = phone.getByRole('region', { name: 'Shared' });
      await shared.waitFor({ timeout: 30_000 });
      if (person === pim) {
        // The same teal as the target: the closest of the kind bands (reference bands).
        await shared.getByRole('heading', { name: 'Very close to the inspiration' }).waitFor();
        await saveScreenshot(phone, 'month-4-share-phone');
      }
      await phone.context().close();
    }
  }, 180_000);

  it('5 · review: a moderator approves one skein and sends one back by keyboard, then features it', async () => {
    expect((await moderator.call('PUT', api('/follow'), { mailOptIn: false })).status).toBe(200);
    const promoted = await host.call('PATCH', api(`/members/${moderator.userId}`), {
      role: 'moderator',
    });
    expect(promoted.status).toBe(200);

    const page = await openAs(moderator, 'desktop', 'console', `/studios/${slug}/review`);
    const card = (name: string) => page.getByRole('article', { name: `Skein by ${name}` });
    await card('Ada Kelpie').waitFor();
    // Oldest first: Pim shared before Ada. Down and back up puts the focus on Pim's.
    await page.keyboard.press('j');
    await page.keyboard.press('k');
    await expect
      .poll(() => card('Pim Shellgrove').evaluate((e) => e === document.activeElement))
      .toBe(true);
    await page.keyboard.press('a');
    await page.getByText('Approved: Pim Shellgrove’s skein.').waitFor();
    await expect
      .poll(() => card('Ada Kelpie').evaluate((e) => e === document.activeElement))
      .toBe(true);
    await page.keyboard.press('c');
    await page.getByRole('dialog', { name: /Ask for a change: Ada Kelpie’s skein/ }).waitFor();
    await page.keyboard.press('1');
    await page.keyboard.press('Enter');
    await page.getByText('Asked for a change: Ada Kelpie’s skein.').waitFor();
    await page.getByText('Nothing waits for review', { exact: false }).waitFor();
    await saveScreenshot(page, 'month-5-review');

    // Among the approved, Pim's (Pim agreed) is featured for the recap.
    await page.getByLabel('Status').selectOption('approved');
    await card('Pim Shellgrove').waitFor();
    await card('Pim Shellgrove').getByRole('button', { name: 'Feature' }).click();
    await page.getByText('Featured: Pim Shellgrove’s skein.').waitFor();
    await page.context().close();

    await waitForMail(pim.email, new RegExp(`Your skein is in the ${title} gallery`), 30_000);
    const sentBack = await waitForMail(
      ada.email,
      /A small change for the skein you shared/,
      30_000,
    );
    expect(sentBack.text).toContain('We could not see the yarn well.');
  }, 120_000);

  it('6 · recap: the host builds a running order and presents it', async () => {
    const page = await openAs(
      host,
      'desktop',
      'console',
      `/studios/${slug}/dye-alongs/${dyeAlongId}`,
    );
    await page.getByRole('button', { name: 'Move on to the recap' }).click();
    await page.getByRole('button', { name: 'Move on to the recap' }).waitFor({ state: 'detached' });
    await page.getByRole('link', { name: 'Recap running order' }).click();
    await page.getByRole('button', { name: 'Add Pool Teal by Pim Shellgrove' }).click();
    await page.getByRole('button', { name: 'Add Pool Teal', exact: true }).click();
    await page.getByRole('button', { name: 'Add Sand Shallows', exact: true }).click();
    await page.getByLabel(/^Note for item 1/).fill('Pim matched the pool water on the first try.');
    await page.getByRole('button', { name: 'Save running order' }).click();
    await page.getByText('Running order saved.').waitFor();
    await saveScreenshot(page, 'month-6-running-order');

    await page.getByRole('link', { name: 'Present full screen' }).click();
    await page.getByText('Ready to record offline').waitFor();
    const shown = page
      .getByRole('region', { name: 'Shown now' })
      .getByRole('heading', { level: 1 });
    const progress = page.getByRole('status').filter({ hasText: /\d+ \/ 3/ });
    await expect.poll(() => progress.textContent()).toContain('1 / 3');
    await page.keyboard.press('ArrowRight');
    await expect.poll(() => progress.textContent()).toContain('2 / 3');
    await expect.poll(() => shown.textContent()).toContain('Pool Teal');
    await page.keyboard.press('End');
    await expect.poll(() => progress.textContent()).toContain('3 / 3');
    await expect.poll(() => shown.textContent()).toContain('Sand Shallows');
    await saveScreenshot(page, 'month-6-presenter');
    await page.context().close();
  }, 120_000);

  it('7 · archive and dye again: bath record, archived, found by color, a batch sheet', async () => {
    const page = await openAs(
      host,
      'desktop',
      'console',
      `/studios/${slug}/dye-alongs/${dyeAlongId}`,
    );
    await page.getByRole('link', { name: 'Fill in the bath records' }).click();
    const form = page.getByRole('form', { name: 'Bath record: Pool Teal' });
    await form.getByLabel('Dry fiber dyed (g)').fill('100');
    await form.getByLabel('Bath volume (mL)').fill('3000');
    await form.getByLabel('Temperature reached (°C)').fill('88');
    await form.getByLabel('Time at temperature (min)').fill('20');
    await form.getByLabel('Did the bath exhaust?').selectOption('yes');
    await form.getByRole('button', { name: 'Save the bath record of Pool Teal' }).click();
    await form.getByText('Saved the bath record of Pool Teal.').waitFor();
    await page.getByRole('link', { name: 'Back to the dye-along' }).click();
    await page.getByRole('button', { name: 'Archive it' }).click();
    await page.getByRole('button', { name: 'Archive it' }).waitFor({ state: 'detached' });

    await page
      .getByRole('navigation', { name: 'Workbench' })
      .getByRole('link', { name: 'Archive' })
      .click();
    await page.getByLabel('Color (hex)').fill(poolWaterHex);
    await page.getByRole('button', { name: 'Search the archive' }).click();
    const results = page.getByRole('list', { name: 'Archived colorways' });
    // The target swatch itself: ΔE2000 0 (identical colors, Sharma et al. 2005).
    await results.getByText('ΔE2000 0 from your color').waitFor();
    await saveScreenshot(page, 'month-7-archive');
    await results.getByRole('link', { name: 'Pool Teal' }).click();
    // 110 mL of a 1 % stock holds 1.1 g of dye; on the 100 g dyed that is 1.1 % depth of shade
    // (common practice: depth of shade = dye mass ÷ dry fiber mass × 100).
    const table = page.getByRole('table', { name: 'Planned and actual amount of each dye' });
    await expect
      .poll(() => table.getByRole('row', { name: /Brinewell Blue/ }).textContent())
      .toContain('1.1');

    const dyeAgain = page.getByRole('form', { name: 'Dye again' });
    await dyeAgain.getByLabel('Skeins').fill('4');
    await dyeAgain.getByLabel('Pot').selectOption({ label: 'Big enamel pot (12 L)' });
    await dyeAgain.getByRole('button', { name: 'Open the batch sheet' }).click();
    const sheet = page.getByRole('article', { name: 'Pool Teal, dyed again' });
    await sheet.waitFor();
    await sheet.getByText('Caution · Hot bath', { exact: false }).waitFor();
    await saveScreenshot(page, 'month-7-batch-sheet');
    const pdf = await page.pdf({ preferCSSPageSize: true, printBackground: true });
    expect(pdf.subarray(0, 4).toString('latin1')).toBe('%PDF');
    await page.context().close();

    // Nothing on any screen of the month logged an error or reached beyond loopback.
    // While offline, Chromium logs each failed reconnect attempt; nothing else may appear.
    const problems = pageProblems.flat().filter((p) => !p.includes('ERR_INTERNET_DISCONNECTED'));
    expect(problems).toEqual([]);
  }, 120_000);
});
