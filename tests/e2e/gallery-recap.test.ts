import { randomUUID } from 'node:crypto';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Gallery, Recap } from '@vatside/contracts/gallery';
import { ApiPerson } from '../support/api.ts';
import {
  appOrigin,
  launchBrowser,
  newContext,
  saveScreenshot,
  watchPage,
} from '../support/browser.ts';
import { makeLiveMonth } from '../support/live-month.ts';

let browser: Browser;
let host: ApiPerson;
let makers: ApiPerson[] = [];
const slug = `e2e-recap-${randomUUID().slice(0, 8)}`;
let dyeAlongId = '';
const api = (rest: string) => `/api/studios/${slug}${rest}`;
const shared: Record<string, string> = {};

/** A skein photo drawn by the browser: the yarn color on the left half, a table on the right. */
async function skeinJpeg(page: Page, yarnHex: string): Promise<Uint8Array> {
  const dataUrl = await page.evaluate((hex) => {
    const canvas = document.createElement('canvas');
    canvas.width = 480;
    canvas.height = 320;
    const g = canvas.getContext('2d')!;
    g.fillStyle = '#c9b79c';
    g.fillRect(0, 0, 480, 320);
    g.fillStyle = hex;
    g.fillRect(0, 0, 240, 320);
    return canvas.toDataURL('image/jpeg', 0.9);
  }, yarnHex);
  return new Uint8Array(Buffer.from(dataUrl.split(',')[1]!, 'base64'));
}

async function shareSkein(
  maker: ApiPerson,
  photo: Uint8Array,
  details: { colorwayId: string; baseName: string; dyesUsed: string[]; consent: boolean },
): Promise<string> {
  const form = new FormData();
  form.append(
    'details',
    JSON.stringify({
      colorwayId: details.colorwayId,
      baseName: details.baseName,
      fiberContent: [{ fiber: 'wool', pct: 100 }],
      dyesUsed: details.dyesUsed,
      notes: 'Dyed on the back burner.',
      consentToFeature: details.consent,
      crops: [{ x: 0, y: 0, width: 0.5, height: 1 }],
    }),
  );
  form.append('photos', new Blob([new Uint8Array(photo)], { type: 'image/jpeg' }), 'skein.jpg');
  const res = await maker.call('POST', api(`/dye-alongs/${dyeAlongId}/submissions`), form);
  if (res.status !== 201) throw new Error(`share ${res.status}: ${await res.text()}`);
  return ((await res.json()) as { id: string }).id;
}

beforeAll(async () => {
  browser = await launchBrowser();
  const names = ['Wren Tallow', 'Otto Marsh', 'Ines Shore', 'Bo Quillfeather', 'Sable Rook'];
  [host, ...makers] = await Promise.all([
    ApiPerson.signUp('e2e-recap-host', 'Halden Brackwater'),
    ...names.map((name, i) => ApiPerson.signUp(`e2e-recap-maker${i}`, name)),
  ]);
  const studio = await host.call('POST', '/api/studios', {
    name: 'Brackwater Test Dyeworks',
    slug,
    accentHex: '#2f5d8a',
  });
  expect(studio.status).toBe(201);
  ({ dyeAlongId } = await makeLiveMonth(host, slug));
  const opened = await host.call('PATCH', api(`/dye-alongs/${dyeAlongId}`), {
    shareOpensAt: new Date(Date.now() - 60_000).toISOString(),
  });
  expect(opened.status).toBe(200);
  const month = (await (
    await host.call('GET', api(`/dye-alongs/${dyeAlongId}/gallery`))
  ).json()) as Gallery;
  const [teal, kelp] = month.colorways;

  const drawing = await browser.newPage();
  const plan = [
    {
      key: 'wren',
      colorway: teal!,
      base: 'Harbor DK',
      dyes: ['Brinewell Blue'],
      hex: '#2d6f86',
      consent: true,
      decision: 'feature',
    },
    {
      key: 'otto',
      colorway: kelp!,
      base: 'Dune Sock',
      dyes: ['Moss gel', 'Lemon gel'],
      hex: '#5b7a2e',
      consent: true,
      decision: 'feature',
    },
    {
      key: 'ines',
      colorway: teal!,
      base: 'Reef Worsted',
      dyes: ['Brinewell Blue', 'Kelp gel'],
      hex: '#1f5a70',
      consent: true,
      decision: 'feature',
    },
    {
      key: 'bo',
      colorway: kelp!,
      base: 'Dune Sock',
      dyes: ['Moss gel'],
      hex: '#6d8a3a',
      consent: false,
      decision: 'approve',
    },
    {
      key: 'sable',
      colorway: teal!,
      base: 'Harbor DK',
      dyes: ['Brinewell Blue'],
      hex: '#3a7f95',
      consent: true,
      decision: null,
    },
  ] as const;
  for (const [i, item] of plan.entries()) {
    const maker = makers[i]!;
    const followed = await maker.call('PUT', api('/follow'), { mailOptIn: false });
    expect(followed.status).toBe(200);
    shared[item.key] = await shareSkein(maker, await skeinJpeg(drawing, item.hex), {
      colorwayId: item.colorway.id,
      baseName: item.base,
      dyesUsed: [...item.dyes],
      consent: item.consent,
    });
    if (item.decision) {
      const decided = await host.call(
        'POST',
        api(`/review/submissions/${shared[item.key]}/decisions`),
        {
          decision: item.decision,
        },
      );
      expect(decided.status).toBe(200);
    }
  }
  // The host's own finished skein of Pool Teal, with the colors it aims at.
  const named = await host.call('PATCH', api(`/colorways/${teal!.id}`), {
    targetSwatches: [
      { hex: '#2d6f86', name: 'Deep pool' },
      { hex: '#8fc1c9', name: 'Shallows' },
    ],
  });
  expect(named.status).toBe(200);
  const photo = new FormData();
  photo.append('purpose', 'colorwayPhoto');
  photo.append('colorwayId', teal!.id);
  photo.append(
    'image',
    new Blob([new Uint8Array(await skeinJpeg(drawing, '#2a6b80'))], { type: 'image/jpeg' }),
    'pool-teal.jpg',
  );
  expect((await host.call('POST', api('/images'), photo)).status).toBe(201);
  await drawing.close();
}, 120_000);

afterAll(() => browser?.close());

describe('the month’s gallery and the recap', () => {
  it('a visitor on a phone browses the gallery: grid, filter by colorway, one skein’s page', async () => {
    const context = await newContext(browser, 'phone');
    const page = await context.newPage();
    const problems = watchPage(page);
    await page.goto(`${appOrigin}/s/${slug}/dye-alongs/${dyeAlongId}`);
    await page.getByRole('link', { name: 'See the month’s skeins' }).click();
    const grid = page.getByRole('list', { name: 'Shared skeins' });
    await grid.getByRole('link').first().waitFor();
    // Three featured and one approved; the skein still waiting for review never shows.
    await expect.poll(() => grid.getByRole('link').count()).toBe(4);
    expect(await grid.getByRole('link', { name: /Sable Rook/ }).count()).toBe(0);
    await page.getByText('Showing 4 of 4 skeins.').waitFor();
    const firstThumb = grid.locator('img').first();
    expect(await firstThumb.getAttribute('loading')).toBe('lazy');
    expect(Number(await firstThumb.getAttribute('width'))).toBeGreaterThan(0);
    // The photos really arrive for a visitor (approved ones are public).
    await expect
      .poll(() => firstThumb.evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth))
      .toBeGreaterThan(0);
    const strip = page.getByRole('region', { name: 'From the studio' });
    await strip.getByText('Deep pool').waitFor();
    await strip.getByRole('img', { name: 'The host’s skein of Pool Teal' }).waitFor();
    await saveScreenshot(page, 'gallery-recap-phone-gallery');

    await page
      .getByRole('group', { name: 'Show colorway' })
      .getByRole('button', { name: 'Kelp Shade' })
      .click();
    await page.getByText('Showing 2 of 2 skeins of Kelp Shade.').waitFor();
    expect(
      await grid
        .getByRole('link')
        .evaluateAll((links) => links.map((l) => l.getAttribute('aria-label'))),
    ).toEqual(['Kelp Shade by Otto Marsh (featured)', 'Kelp Shade by Bo Quillfeather']);
    expect(page.url()).toContain('colorway=');

    await grid.getByRole('link', { name: 'Kelp Shade by Otto Marsh (featured)' }).click();
    await page.getByRole('heading', { level: 1, name: 'Kelp Shade' }).waitFor();
    expect(page.url()).toContain(`/gallery/${shared.otto}`);
    await page.getByText('Dyed by').getByText('Otto Marsh').waitFor();
    await page.getByText('Dune Sock').waitFor();
    await page.getByText('Moss gel, Lemon gel').waitFor();
    await page.getByRole('img', { name: /Photo 1 of 1: Kelp Shade by Otto Marsh/ }).waitFor();
    await saveScreenshot(page, 'gallery-recap-phone-skein');

    // The skein's address works on its own, for someone it was passed to.
    await page.goto(`${appOrigin}/s/${slug}/dye-alongs/${dyeAlongId}/gallery/${shared.sable}`);
    await page.getByText('This skein is not in the gallery').waitFor();
    expect(problems.filter((p) => !p.includes('404'))).toEqual([]);
    await context.close();
  }, 90_000);

  it('the host builds a running order of three and steps through the presenter by keyboard', async () => {
    const context = await newContext(browser, 'desktop');
    const page = await context.newPage();
    const problems = watchPage(page);
    await page.goto(
      `${appOrigin}/console/sign-in?next=${encodeURIComponent(`/studios/${slug}/dye-alongs/${dyeAlongId}`)}`,
    );
    await page.getByLabel('E-mail').fill(host.email);
    await page.getByLabel('Password').fill(host.password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('link', { name: 'Recap running order' }).click();

    const toAdd = page.getByRole('list', { name: 'Featured skeins to add' });
    // Only consenting featured skeins are offered: not the approved one, not the waiting one.
    await expect.poll(() => toAdd.getByRole('button').count()).toBe(3);
    await page.getByRole('button', { name: 'Add Pool Teal by Wren Tallow' }).click();
    await page.getByRole('button', { name: 'Add Kelp Shade by Otto Marsh' }).click();
    await page.getByRole('button', { name: 'Add Pool Teal', exact: true }).click();
    await page.getByRole('button', { name: 'Move item 3 up' }).click();
    await page.getByLabel(/^Note for item 1/).fill('Wren dyed this on a camp stove.');
    await page.getByRole('button', { name: 'Save running order' }).click();
    await page.getByText('Running order saved.').waitFor();
    await saveScreenshot(page, 'gallery-recap-desktop-running-order');

    const saved = (await (
      await host.call('GET', api(`/dye-alongs/${dyeAlongId}/recap`))
    ).json()) as Recap;
    expect(
      saved.items.map((i) => (i.kind === 'skein' ? i.skein.makerName : i.colorway.name)),
    ).toEqual(['Wren Tallow', 'Pool Teal', 'Otto Marsh']);
    expect(saved.items[0]!.note).toBe('Wren dyed this on a camp stove.');

    await page.getByRole('link', { name: 'Present full screen' }).click();
    const progress = page.getByRole('status');
    const shown = page
      .getByRole('region', { name: 'Shown now' })
      .getByRole('heading', { level: 1 });
    await page.getByText('Ready to record offline').waitFor();
    expect(await progress.textContent()).toBe('1 / 3');
    expect(await shown.textContent()).toBe('Wren Tallow');
    await saveScreenshot(page, 'gallery-recap-desktop-presenter');

    await page.keyboard.press('PageDown');
    await expect.poll(() => progress.textContent()).toBe('2 / 3');
    expect(await shown.textContent()).toBe('Pool Teal');
    await page.getByRole('img', { name: 'Pool Teal (the studio’s own)' }).waitFor();
    await page.keyboard.press('Space');
    await expect.poll(() => progress.textContent()).toBe('3 / 3');
    expect(await shown.textContent()).toBe('Otto Marsh');
    await page.keyboard.press('Home');
    await expect.poll(() => progress.textContent()).toBe('1 / 3');
    await page.keyboard.press('ArrowRight');
    await expect.poll(() => progress.textContent()).toBe('2 / 3');
    await page.keyboard.press('n');
    await page.getByRole('complementary', { name: 'Your note' }).waitFor();
    await saveScreenshot(page, 'gallery-recap-desktop-presenter-note');
    expect(problems).toEqual([]);
    await context.close();
  }, 90_000);
});
