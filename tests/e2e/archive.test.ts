import { randomUUID } from 'node:crypto';
import { mkdirSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ApiPerson } from '../support/api.ts';
import {
  appOrigin,
  launchBrowser,
  newContext,
  saveScreenshot,
  signInThroughForm,
  watchPage,
} from '../support/browser.ts';
import { makeLiveMonth, type LiveMonth } from '../support/live-month.ts';

// Step 7 of the month: the host logs the pot during the live session, fills in the bath record,
// archives the month, finds the colorway by color, and prints a batch sheet to dye it again.
// Pool Teal (from the live-month support): one 100 g skein at 1 % depth of shade from a 1 % stock,
// so the plan is 100 mL of a 500 mL jar (stock mL = WOG × DOS ÷ strength, common practice,
// packages/dye-kit/test-data/README.md).

let browser: Browser;
let host: ApiPerson;
let month: LiveMonth;
const slug = `e2e-archive-${randomUUID().slice(0, 8)}`;
const api = (rest: string) => `/api/studios/${slug}${rest}`;

beforeAll(async () => {
  browser = await launchBrowser();
  host = await ApiPerson.signUp('e2e-archive-host', 'Maren Wrackwood');
  const studio = await host.call('POST', '/api/studios', {
    name: 'Wrackwood Test Dyeworks',
    slug,
    accentHex: '#1f6f78',
  });
  expect(studio.status).toBe(201);
  month = await makeLiveMonth(host, slug);
  const list = (await (await host.call('GET', api('/colorways'))).json()) as {
    items: { id: string; name: string }[];
  };
  const swatches: Record<string, { hex: string; name: string }> = {
    'Pool Teal': { hex: '#1f6f78', name: 'deep pool' },
    'Kelp Shade': { hex: '#3f7a4a', name: 'kelp' },
  };
  for (const colorway of list.items) {
    const patched = await host.call('PATCH', api(`/colorways/${colorway.id}`), {
      targetSwatches: [swatches[colorway.name]],
    });
    expect(patched.status).toBe(200);
  }
  const pot = await host.call('POST', api('/pots'), {
    name: 'Twelve-liter pot',
    capacityMl: 12_000,
    material: 'stainlessSteel',
  });
  expect(pot.status).toBe(201);
}, 60_000);

afterAll(() => browser?.close());

describe('archive and dye again (desktop)', () => {
  it('logs the pot, records the bath, archives, finds by color and prints a batch sheet', async () => {
    const context = await newContext(browser, 'desktop');
    const page = await context.newPage();
    const problems = watchPage(page);

    // Live: the host logs 90 mL of teal stock instead of the planned 100 mL.
    await signInThroughForm(page, host, 'console', `/studios/${slug}/live`);
    await page
      .getByRole('article', { name: month.title })
      .getByRole('button', { name: 'Go live' })
      .click();
    const log = page.getByRole('region', { name: 'Dye log · Pool Teal' });
    await log.getByRole('button', { name: /^Adjust / }).click();
    await log.getByLabel(/^Amount of .* that went in \(mL\)$/).fill('90');
    await log.getByRole('button', { name: 'Log', exact: true }).click();
    await log.getByRole('list', { name: 'Logged for Pool Teal' }).getByText('adjusted').waitFor();

    // After the session: the bath record, from the dye-along's page.
    await page.goto(`${appOrigin}/console/studios/${slug}/dye-alongs/${month.dyeAlongId}`);
    await page.getByRole('link', { name: 'Fill in the bath records' }).click();
    const form = page.getByRole('form', { name: 'Bath record: Pool Teal' });
    await form.getByLabel('Dry fiber dyed (g)').fill('100');
    await form.getByLabel('Bath volume (mL)').fill('3000');
    await form.getByLabel('Temperature reached (°C)').fill('88');
    await form.getByLabel('Time at temperature (min)').fill('20');
    await form.getByLabel('Did the bath exhaust?').selectOption('yes');
    await form.getByLabel('Base lot').fill('TS-0412');
    await form.getByLabel('Dye lots').fill('Brinewell Blue: BB-77');
    await form.getByRole('button', { name: 'Save the bath record of Pool Teal' }).click();
    await form.getByText('Saved the bath record of Pool Teal.').waitFor();
    await saveScreenshot(page, 'archive-bath-record');

    // The month moves on to the archive.
    await page.getByRole('link', { name: 'Back to the dye-along' }).click();
    for (const move of ['Open skein sharing', 'Move on to the recap', 'Archive it']) {
      await page.getByRole('button', { name: move }).click();
      await page.getByRole('button', { name: move }).waitFor({ state: 'detached' });
    }

    // Found by color: the exact swatch is ΔE2000 0 (identical colors, Sharma et al. 2005).
    await page
      .getByRole('navigation', { name: 'Workbench' })
      .getByRole('link', { name: 'Archive' })
      .click();
    await page.getByLabel('Color (hex)').fill('#1f6f78');
    await page.getByRole('button', { name: 'Search the archive' }).click();
    const results = page.getByRole('list', { name: 'Archived colorways' });
    await results.getByText('ΔE2000 0 from your color').waitFor();
    const names = await results.getByRole('heading').allTextContents();
    expect(names[0]).toBe('Pool Teal');
    await saveScreenshot(page, 'archive-search-by-color');

    // Planned against actual: 100 mL planned, 90 mL logged, −10 %; depth of shade reached
    // 90 mL × 1 % = 0.9 g on 100 g = 0.9 % (common practice).
    await results.getByRole('link', { name: 'Pool Teal' }).click();
    const table = page.getByRole('table', { name: 'Planned and actual amount of each dye' });
    const row = table.getByRole('row', { name: /Brinewell Blue/ });
    await expect.poll(() => row.textContent()).toContain('100 mL');
    expect(await row.textContent()).toContain('90 mL');
    expect(await row.textContent()).toContain('−10 %');
    expect(await row.textContent()).toContain('1 % → 0.9 %');
    await saveScreenshot(page, 'archive-detail');

    // Dye again: five skeins in a 12 L pot. 5 × 100 g × 0.9 % ÷ 1 % = 450 mL of stock; the jar
    // has 500 − 90 = 410 mL, so 40 mL (0.4 g of powder) must be mixed first. The bath was
    // 3 000 mL on 100 g (30:1); a 12 L pot filled to 80 % holds 9 600 mL: 3 skeins, then 2.
    const dyeAgain = page.getByRole('form', { name: 'Dye again' });
    await dyeAgain.getByLabel('Skeins').fill('5');
    await dyeAgain.getByLabel('Pot').selectOption({ label: 'Twelve-liter pot (12 L)' });
    await dyeAgain.getByRole('button', { name: 'Open the batch sheet' }).click();
    const sheet = page.getByRole('article', { name: 'Pool Teal, dyed again' });
    await sheet.waitFor();
    await sheet.getByText('0.9 % depth of shade', { exact: false }).waitFor();
    await sheet.getByRole('heading', { name: 'Mix these first' }).waitFor();
    const short = sheet.getByRole('listitem').filter({ hasText: 'Short:' });
    expect(await short.textContent()).toContain('Mix 40 mL (0.4 g of dye powder');
    await sheet.getByRole('heading', { name: 'Batch 1 of 2 · 3 skeins', exact: false }).waitFor();
    await sheet.getByRole('heading', { name: 'Batch 2 of 2 · 2 skeins', exact: false }).waitFor();
    await sheet.getByText('Caution · Hot bath', { exact: false }).waitFor();
    await page.getByLabel('Paper').selectOption('a4');
    expect(await sheet.getAttribute('class')).toContain('vs-paper-a4');
    await saveScreenshot(page, 'archive-batch-sheet');

    const pdf = await page.pdf({ preferCSSPageSize: true, printBackground: true });
    expect(pdf.subarray(0, 4).toString('latin1')).toBe('%PDF');
    const pages = pdf.toString('latin1').match(/\/Type\s*\/Page\b/g) ?? [];
    expect(pages.length).toBeGreaterThanOrEqual(1);
    const resultsDir = process.env.VATSIDE_TEST_RESULTS ?? path.resolve('.local/test/results');
    mkdirSync(resultsDir, { recursive: true });
    writeFileSync(path.join(resultsDir, 'archive-batch-sheet.pdf'), pdf);
    await page.emulateMedia({ media: 'print' });
    await saveScreenshot(page, 'archive-batch-sheet-print');

    expect(problems).toEqual([]);
    await context.close();
  });
});
