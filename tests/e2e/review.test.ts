import { randomUUID } from 'node:crypto';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ApiPerson, waitForMail } from '../support/api.ts';
import {
  launchBrowser,
  newContext,
  saveScreenshot,
  signInThroughForm,
  watchPage,
} from '../support/browser.ts';
import { makeLiveMonth, type LiveMonth } from '../support/live-month.ts';
import { skeinPng } from '../support/skein-png.ts';

let browser: Browser;
let host: ApiPerson;
let moderator: ApiPerson;
let sharers: ApiPerson[];
let month: LiveMonth;
const slug = `e2e-review-${randomUUID().slice(0, 8)}`;
const ids: string[] = [];

/** Shares one skein through the real multipart route (yarn on the left half of the photo). */
async function share(person: ApiPerson, yarnHex: string, consentToFeature: boolean) {
  const form = new FormData();
  form.append(
    'details',
    JSON.stringify({
      baseName: 'Tidewrack Sock',
      fiberContent: [
        { fiber: 'wool', pct: 75 },
        { fiber: 'nylon', pct: 25 },
      ],
      dyesUsed: ['Brinewell Blue'],
      notes: 'Dyed the day after the live.',
      consentToFeature,
      crops: [{ x: 0, y: 0, width: 0.5, height: 1 }],
    }),
  );
  form.append(
    'photos',
    new Blob([new Uint8Array(skeinPng(yarnHex))], { type: 'image/png' }),
    'skein.png',
  );
  const res = await person.call(
    'POST',
    `/api/studios/${slug}/dye-alongs/${month.dyeAlongId}/submissions`,
    form,
  );
  expect(res.status, await res.clone().text()).toBe(201);
  ids.push(((await res.json()) as { id: string }).id);
}

beforeAll(async () => {
  browser = await launchBrowser();
  [host, moderator, ...sharers] = await Promise.all([
    ApiPerson.signUp('e2e-review-host', 'Maren Saltcote'),
    ApiPerson.signUp('e2e-review-mod', 'Tamsin Reedbank'),
    ApiPerson.signUp('e2e-review-a', 'Arlo Fennick'),
    ApiPerson.signUp('e2e-review-b', 'Bryony Cask'),
    ApiPerson.signUp('e2e-review-c', 'Cato Wendle'),
  ]);
  const studio = await host.call('POST', '/api/studios', {
    name: 'Saltcote Test Dyeworks',
    slug,
    accentHex: '#2f5d8a',
  });
  expect(studio.status).toBe(201);
  month = await makeLiveMonth(host, slug);
  // The host opens sharing early (before the live session), which the sharing window allows.
  const opened = await host.call('PATCH', `/api/studios/${slug}/dye-alongs/${month.dyeAlongId}`, {
    shareOpensAt: new Date(Date.now() - 60_000).toISOString(),
  });
  expect(opened.status, await opened.clone().text()).toBe(200);
  for (const person of [moderator, ...sharers]) {
    const followed = await person.call('PUT', `/api/studios/${slug}/follow`, { mailOptIn: false });
    expect(followed.status).toBe(200);
  }
  const promoted = await host.call('PATCH', `/api/studios/${slug}/members/${moderator.userId}`, {
    role: 'moderator',
  });
  expect(promoted.status).toBe(200);
  // Oldest first: Arlo, then Bryony, then Cato (who agrees to be featured).
  await share(sharers[0]!, '#1b7f86', false);
  await share(sharers[1]!, '#e07a93', false);
  await share(sharers[2]!, '#3f7a4a', true);
}, 90_000);

afterAll(() => browser?.close());

const card = (page: Page, name: string) => page.getByRole('article', { name: `Skein by ${name}` });

describe('the review queue, worked by keyboard', () => {
  it('a moderator approves, sends back and features; the audit and the sharers’ e-mails follow', async () => {
    // A look at the queue on a tablet first.
    const tablet = await browser.newContext({ viewport: { width: 820, height: 1180 } });
    const tabletPage = await tablet.newPage();
    await signInThroughForm(tabletPage, moderator, 'console', `/studios/${slug}/review`);
    await card(tabletPage, 'Cato Wendle').waitFor();
    await saveScreenshot(tabletPage, 'review-queue-tablet');
    await tablet.close();

    const context = await newContext(browser, 'desktop');
    const page = await context.newPage();
    const problems = watchPage(page);
    await signInThroughForm(page, moderator, 'console', `/studios/${slug}/review`);
    await card(page, 'Cato Wendle').waitFor();
    await expect
      .poll(() => page.getByRole('link', { name: /^Review/ }).textContent())
      .toBe('Review3 waiting');
    const order = await page
      .getByRole('article')
      .evaluateAll((els) => els.map((e) => e.getAttribute('aria-label')));
    expect(order).toEqual([
      'Skein by Arlo Fennick',
      'Skein by Bryony Cask',
      'Skein by Cato Wendle',
    ]);

    // Down to Bryony's skein: it takes the focus; C asks for a change, 1 picks "yarn hard to see".
    await page.keyboard.press('j');
    await expect
      .poll(() => card(page, 'Bryony Cask').evaluate((e) => e === document.activeElement))
      .toBe(true);
    await saveScreenshot(page, 'review-queue-desktop');
    await page.keyboard.press('c');
    const dialog = page.getByRole('dialog', { name: /Ask for a change: Bryony Cask’s skein/ });
    await dialog.waitFor();
    await page.keyboard.press('1');
    await saveScreenshot(page, 'review-reason-desktop');
    await page.keyboard.press('Enter');
    await page.getByText('Asked for a change: Bryony Cask’s skein.').waitFor();

    // Back up to Arlo's and approve it.
    await page.keyboard.press('k');
    await expect
      .poll(() => card(page, 'Arlo Fennick').evaluate((e) => e === document.activeElement))
      .toBe(true);
    await page.keyboard.press('a');
    await page.getByText('Approved: Arlo Fennick’s skein.').waitFor();

    // Cato's is the one left and has the focus; F features it (Cato agreed).
    await expect
      .poll(() => card(page, 'Cato Wendle').evaluate((e) => e === document.activeElement))
      .toBe(true);
    await page.keyboard.press('f');
    await page.getByText('Featured: Cato Wendle’s skein.').waitFor();
    await page.getByText('Nothing waits for review', { exact: false }).waitFor();

    const status = async (id: string) =>
      (
        (await (
          await moderator.call('GET', `/api/studios/${slug}/review/submissions/${id}`)
        ).json()) as { status: string }
      ).status;
    expect([await status(ids[0]!), await status(ids[1]!), await status(ids[2]!)]).toEqual([
      'approved',
      'needsChanges',
      'featured',
    ]);

    // The audit lists the three decisions, newest first, with who made them.
    await page.getByRole('link', { name: 'Every decision so far' }).click();
    const table = page.getByRole('table', { name: 'Review decisions, newest first' });
    await table.waitFor();
    const rows = table.getByRole('row');
    await expect.poll(() => rows.count()).toBe(4);
    const texts = await rows.allInnerTexts();
    expect(texts[1]).toMatch(/Tamsin Reedbank\s+Featured\s+Waiting → Featured/);
    expect(texts[2]).toMatch(/Tamsin Reedbank\s+Approved\s+Waiting → In the gallery/);
    expect(texts[3]).toMatch(
      /Tamsin Reedbank\s+Asked for a change\s+Waiting → Sent back for a change/,
    );
    expect(texts[3]).toContain('We could not see the yarn well.');
    await saveScreenshot(page, 'review-audit-desktop');
    await page.setViewportSize({ width: 820, height: 1180 });
    await saveScreenshot(page, 'review-audit-tablet');

    // The sharers' e-mails, through the outbox and the mail job.
    const approved = await waitForMail(
      sharers[0]!.email,
      /Your skein is in the Tide pool month gallery/,
    );
    expect(approved.text).toContain('Arlo Fennick');
    const sentBack = await waitForMail(
      sharers[1]!.email,
      /A small change for the skein you shared/,
    );
    expect(sentBack.text).toContain(
      'We could not see the yarn well. Please mark the yarn area or crop closer.',
    );
    await waitForMail(sharers[2]!.email, /will be featured in the Tide pool month recap/);

    expect(problems).toEqual([]);
    await context.close();
  });
});
