import { randomUUID } from 'node:crypto';
import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ApiPerson } from '../support/api.ts';
import {
  launchBrowser,
  newContext,
  saveScreenshot,
  signInThroughForm,
  watchPage,
} from '../support/browser.ts';
import { encodePng } from '../support/images.ts';

// The host plans a colorway in the console against the real server: base, stock solution,
// colorway with two recipe lines and a three-step run sheet, amounts for a 115 g skein, an
// inspiration image with its palette, and a renamed swatch.

let browser: Browser;
let host: ApiPerson;
const slug = `e2e-bench-${randomUUID().slice(0, 8)}`;
const studio = `/studios/${slug}`;

/** Invented rock pool: deep teal water, sand, and a coral band. */
const rockPool = encodePng(120, 80, (x, y) =>
  y < 40 ? [31, 122, 140] : x < 80 ? [217, 201, 163] : [224, 106, 78],
);

beforeAll(async () => {
  browser = await launchBrowser();
  host = await ApiPerson.signUp('e2e-bench', 'Perrin Saltmarsh');
  const created = await host.call('POST', '/api/studios', {
    name: 'Wavecut Test Dyehouse',
    slug,
    accentHex: '#1f6f78',
  });
  expect(created.status).toBe(201);
});

afterAll(() => browser?.close());

describe('the host plans a colorway on the workbench (desktop)', () => {
  it('creates a base, a stock, a colorway with a run sheet, and names a swatch', async () => {
    const context = await newContext(browser, 'desktop');
    const page = await context.newPage();
    const problems = watchPage(page);
    await signInThroughForm(page, host, 'console', `${studio}/bases`);

    // A base.
    const baseForm = page.getByRole('form', { name: 'Add a base' });
    await baseForm.getByLabel('Base name').fill('Tidewrack sock');
    await baseForm.getByLabel('Lot').fill('TW-11');
    await baseForm.getByRole('button', { name: 'Add base' }).click();
    await page
      .getByRole('table', { name: 'Yarn bases' })
      .getByText('Tidewrack sock', { exact: true })
      .waitFor();
    await saveScreenshot(page, 'workbench-bases');

    // A dye and a stock solution mixed from it.
    await page
      .getByRole('navigation', { name: 'Workbench' })
      .getByRole('link', { name: 'Dye shelf' })
      .click();
    const dyeForm = page.getByRole('form', { name: 'Add a dye' });
    await dyeForm.getByLabel('Dye name').fill('Rockpool teal');
    await dyeForm.getByLabel('Kind').selectOption('acidDyePowder');
    await dyeForm.getByRole('button', { name: 'Add dye' }).click();
    await page
      .getByRole('table', { name: 'Dyes on the shelf' })
      .getByText('Rockpool teal')
      .waitFor();
    const stockForm = page.getByRole('form', { name: 'Add a stock solution' });
    await stockForm.getByLabel('Strength (% w/v)').fill('1');
    await stockForm.getByLabel('Volume made').fill('500');
    await stockForm.getByRole('button', { name: 'Add stock solution' }).click();
    await page
      .getByRole('table', { name: 'Stock solutions' })
      .getByText('500 mL')
      .first()
      .waitFor();
    await saveScreenshot(page, 'workbench-shelf');

    // A colorway with two recipe lines.
    await page
      .getByRole('navigation', { name: 'Workbench' })
      .getByRole('link', { name: 'Colorways' })
      .click();
    const start = page.getByRole('form', { name: 'Start a colorway' });
    await start.getByLabel('Colorway name').fill('Low tide');
    await start.getByRole('button', { name: 'Start colorway' }).click();
    const recipe = page.getByRole('form', { name: 'Colorway recipe' });
    await recipe.getByRole('button', { name: 'Add a stock solution line' }).click();
    await recipe
      .getByRole('group', { name: 'Line 1' })
      .getByLabel('Stock solution')
      .selectOption({ label: 'Rockpool teal · 1 %' });
    await recipe.getByRole('group', { name: 'Line 1' }).getByLabel('Depth of shade').fill('1.5');
    await recipe.getByRole('button', { name: 'Add a food color line' }).click();
    await recipe.getByRole('group', { name: 'Line 2' }).getByLabel('Color name').fill('Lemon gel');
    await recipe.getByRole('group', { name: 'Line 2' }).getByLabel('Amount per 100 g').fill('0.5');
    await recipe
      .getByRole('group', { name: 'Line 2' })
      .getByLabel('Measured in')
      .selectOption('gGel');
    await recipe.getByRole('button', { name: 'Save recipe' }).click();
    const amounts = page.getByRole('region', { name: 'Amounts' });
    // 100 g at 1.5 % from a 1 % stock: 150 mL holding 1.5 g of dye (common practice).
    const tealRow = amounts.getByRole('row', { name: /Rockpool teal/ });
    await expect.poll(() => tealRow.textContent()).toContain('150 mLof stock · 1.5 g dye');
    await expect
      .poll(() => amounts.getByRole('row', { name: /Lemon gel/ }).textContent())
      .toContain('0.5 gof gel');

    // A three-step run sheet.
    const stepForm = page.getByRole('form', { name: 'Add a step' });
    const sheet = page.getByRole('list', { name: 'Run sheet' });
    await stepForm
      .getByLabel('What to do')
      .fill('Soak the skein in warm water with a drop of wool wash');
    await stepForm.getByLabel('Timer (optional)').fill('30:00');
    await stepForm.getByRole('button', { name: 'Add step' }).click();
    await sheet.getByText('Soak the skein').waitFor();
    await stepForm.getByLabel('What to do').fill('Heat the bath slowly');
    await stepForm.getByLabel('Temperature (optional)').fill('85');
    await stepForm
      .getByLabel('What the bath looks like then')
      .fill('Steady steam, tiny bubbles on the pot floor');
    await stepForm.getByLabel('Caution').selectOption('hotBath');
    await stepForm.getByRole('button', { name: 'Add step' }).click();
    await sheet.getByText('Caution · Hot bath').waitFor();
    await stepForm.getByLabel('What to do').fill('Pour in the teal stock and stir gently');
    await stepForm.getByLabel('Amount to measure (optional)').selectOption({ index: 1 });
    await stepForm.getByRole('button', { name: 'Add step' }).click();
    await sheet.getByText('Measure: Rockpool teal, 150 mL').waitFor();

    // Reorder by keyboard: the third step moves up.
    await sheet.getByRole('button', { name: 'Move step 3 up' }).focus();
    await page.keyboard.press('Enter');
    await expect
      .poll(async () => {
        const list = await page.evaluate(() =>
          Array.from(
            document.querySelectorAll('ol[aria-label="Run sheet"] > li p'),
            (p) => p.textContent,
          ),
        );
        return list[1];
      })
      .toContain('Pour in the teal stock');

    // Amounts for a viewer's 115 g skein.
    const other = page.getByRole('region', { name: 'Another skein' });
    await other.getByLabel('Dry weight of the other skein').fill('115');
    await other.getByRole('button', { name: 'Work out amounts' }).click();
    await expect
      .poll(() => other.getByRole('row', { name: /Rockpool teal/ }).textContent())
      .toContain('172.5 mLof stock · 1.73 g dye');
    await saveScreenshot(page, 'workbench-colorway');

    // An inspiration image and a renamed swatch.
    await page
      .getByRole('navigation', { name: 'Workbench' })
      .getByRole('link', { name: 'Inspiration' })
      .click();
    await page.getByLabel('Image file').setInputFiles({
      name: 'rock-pool.png',
      mimeType: 'image/png',
      buffer: rockPool,
    });
    await page.getByRole('button', { name: 'Upload and find its palette' }).click();
    const image = page.getByRole('article', { name: 'Inspiration image 1' });
    await image.getByLabel('Name for swatch 1').fill('Kelp shadow');
    await image.getByRole('button', { name: 'Save palette' }).click();
    await image.getByText('Palette saved.').waitFor();
    await expect
      .poll(async () => {
        const res = await host.call('GET', `/api/studios/${slug}/images?purpose=inspiration`);
        const { items } = (await res.json()) as { items: { palette: { label: string }[] }[] };
        return items[0]?.palette[0]?.label;
      })
      .toBe('Kelp shadow');
    await image.getByRole('img').evaluate((img: HTMLImageElement) => img.decode());
    await saveScreenshot(page, 'workbench-inspiration');

    await page
      .getByRole('navigation', { name: 'Workbench' })
      .getByRole('link', { name: 'Calculators' })
      .click();
    await page.getByText('Measure 100 mL of stock').waitFor();
    await saveScreenshot(page, 'workbench-calculators');

    expect(problems).toEqual([]);
    await context.close();
  });
});

describe('the workbench on a phone', () => {
  it('shows the colorway and the calculators at 390 px wide', async () => {
    const context = await newContext(browser, 'phone');
    const page = await context.newPage();
    const problems = watchPage(page);
    await signInThroughForm(page, host, 'console', `${studio}/colorways`);
    await page.getByRole('link', { name: 'Low tide' }).click();
    await page
      .getByRole('region', { name: 'Amounts' })
      .getByRole('row', { name: /Rockpool teal/ })
      .waitFor();
    await page.getByRole('list', { name: 'Run sheet' }).waitFor();
    await saveScreenshot(page, 'workbench-colorway-phone');
    await page
      .getByRole('navigation', { name: 'Workbench' })
      .getByRole('link', { name: 'Calculators' })
      .click();
    await page.getByText('Measure 100 mL of stock').waitFor();
    await saveScreenshot(page, 'workbench-calculators-phone');
    expect(problems).toEqual([]);
    await context.close();
  });
});
