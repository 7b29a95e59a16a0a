import { randomUUID } from 'node:crypto';
import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ApiPerson, created } from '../support/api.ts';
import {
  appOrigin,
  launchBrowser,
  newContext,
  saveScreenshot,
  watchPage,
} from '../support/browser.ts';
import { drawSkeinJpeg } from '../support/images.ts';

// Step 4 of the month on a phone: a follower shares a photo of their skein (drawn in code),
// watches it upload, reads how close it came in words, finds it waiting in My skeins, and
// withdraws another share.

let browser: Browser;
let host: ApiPerson;
let viewer: ApiPerson;
let dyeAlongId = '';
const slug = `e2e-share-${randomUUID().slice(0, 8)}`;
const yarnHex = '#2d6f86';

beforeAll(async () => {
  browser = await launchBrowser();
  const [hostPerson, follower] = await Promise.all([
    ApiPerson.signUp('e2e-share-host', 'Isolde Wrackline'),
    ApiPerson.signUp('e2e-share-viewer', 'Pim Shellgrove'),
  ]);
  host = hostPerson;
  viewer = follower;
  await created(
    await host.call('POST', '/api/studios', {
      name: 'Wrackline Test Dyeworks',
      slug,
      accentHex: '#1f6f78',
    }),
  );
  // The month's target color is the yarn's own, so the skein should come out "very close".
  const colorway = await created<{ id: string }>(
    await host.call('POST', `/api/studios/${slug}/colorways`, {
      name: 'Pool Teal',
      technique: 'immersion',
      weightOfGoodsG: 100,
      targetSwatches: [{ hex: yarnHex, name: 'Pool teal' }],
    }),
  );
  const dyeAlong = await created<{ id: string }>(
    await host.call('POST', `/api/studios/${slug}/dye-alongs`, {
      title: 'Tide pool month',
      timeZone: 'America/Halifax',
      startsAt: new Date(Date.now() + 86_400_000).toISOString(),
      colorwayIds: [colorway.id],
      shareOpensAt: new Date(Date.now() - 60_000).toISOString(),
    }),
  );
  dyeAlongId = dyeAlong.id;
  const announced = await host.call(
    'POST',
    `/api/studios/${slug}/dye-alongs/${dyeAlongId}/transitions`,
    { to: 'announced' },
  );
  expect(announced.status).toBe(200);
  expect(
    (await viewer.call('PUT', `/api/studios/${slug}/follow`, { mailOptIn: false })).status,
  ).toBe(200);
});

afterAll(() => browser?.close());

describe('sharing a skein from a phone', () => {
  it('shares with progress and kind words, lists it as waiting, withdraws another', async () => {
    const context = await newContext(browser, 'phone');
    const page = await context.newPage();
    const problems = watchPage(page);
    const share = `/s/${slug}/dye-alongs/${dyeAlongId}/share`;

    // Not signed in yet: the dye-along's page leads to sharing, which asks to sign in first.
    await page.goto(`${appOrigin}/s/${slug}/dye-alongs/${dyeAlongId}`);
    await page.getByText('Sharing is open.').waitFor();
    await saveScreenshot(page, 'dye-along-share-link-phone');
    await page.getByRole('link', { name: 'Share your skein' }).click();
    await page.waitForURL(/\/sign-in\?/);
    expect(new URL(page.url()).searchParams.get('next')).toBe(share);
    await page.getByLabel('E-mail').fill(viewer.email);
    await page.getByLabel('Password').fill(viewer.password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('heading', { name: 'Share your skein', level: 1 }).waitFor();

    await page.getByLabel('Choose from photos').setInputFiles({
      name: 'skein.jpg',
      mimeType: 'image/jpeg',
      buffer: await drawSkeinJpeg(page, yarnHex),
    });
    await page.getByRole('group', { name: /Yarn area on Photo 1/ }).waitFor();
    await page.getByLabel('Which colorway inspired it?').selectOption({ label: 'Pool Teal' });
    await page.getByLabel('Yarn base').fill('Shoreline Sock');
    await page.getByLabel('Main fiber').selectOption('wool');
    await page.getByLabel('Dyes used').fill('teal gel, vinegar');
    await saveScreenshot(page, 'share-form-phone');

    // Hold the upload a moment so the bar can be seen on a fast loopback.
    await page.route('**/submissions', async (route) => {
      await new Promise((r) => setTimeout(r, 700));
      await route.continue();
    });
    await page.getByRole('button', { name: 'Share my skein' }).click();
    await page.getByRole('progressbar', { name: 'Uploading the photos' }).waitFor();

    const shared = page.getByRole('region', { name: 'Shared' });
    await shared.waitFor({ timeout: 20_000 });
    // Flat teal against a teal target: ΔE2000 well under 5, the closest band (reference bands).
    await shared.getByRole('heading', { name: 'Very close to the inspiration' }).waitFor();
    expect(await shared.textContent()).not.toMatch(/\d|score|%/i);
    expect(await shared.getByRole('listitem').count()).toBeGreaterThan(0);
    await saveScreenshot(page, 'share-result-phone');

    // A second share, sent straight from the phone, to withdraw below.
    const second = await page.evaluate(
      async ({ path, photo }) => {
        const form = new FormData();
        form.append('details', JSON.stringify({ baseName: 'Harbor DK' }));
        const bytes = Uint8Array.from(atob(photo), (c) => c.charCodeAt(0));
        form.append('photos', new Blob([bytes], { type: 'image/jpeg' }), 'second.jpg');
        return (await fetch(path, { method: 'POST', body: form })).status;
      },
      {
        path: `/api/studios/${slug}/dye-alongs/${dyeAlongId}/submissions`,
        photo: (await drawSkeinJpeg(page, yarnHex)).toString('base64'),
      },
    );
    expect(second).toBe(201);

    await shared.getByRole('link', { name: 'See My skeins' }).click();
    await page.getByRole('heading', { name: 'My skeins', level: 1 }).waitFor();
    const mine = page.getByRole('listitem', { name: 'Shoreline Sock' });
    await mine.getByText('Waiting for review').waitFor();
    const other = page.getByRole('listitem', { name: 'Harbor DK' });
    await other.waitFor();
    await saveScreenshot(page, 'my-skeins-phone');

    await other.getByRole('button', { name: 'Withdraw…' }).click();
    await other.getByRole('button', { name: 'Yes, withdraw it' }).click();
    await other.waitFor({ state: 'detached' });
    await mine.waitFor();

    const left = await viewer.call('GET', `/api/studios/${slug}/my-submissions`);
    const list = (await left.json()) as { items: { baseName: string; status: string }[] };
    expect(list.items).toEqual([
      expect.objectContaining({ baseName: 'Shoreline Sock', status: 'waiting' }),
    ]);
    expect(problems).toEqual([]);
    await context.close();
  });

  it('shows the host the studio’s storage beside its members', async () => {
    const context = await newContext(browser, 'desktop');
    const page = await context.newPage();
    const problems = watchPage(page);
    const next = `/studios/${slug}/members`;
    await page.goto(`${appOrigin}/console/sign-in?next=${encodeURIComponent(next)}`);
    await page.getByLabel('E-mail').fill(host.email);
    await page.getByLabel('Password').fill(host.password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    const panel = page.getByRole('region', { name: 'Storage' });
    await panel.getByText('Shared skein photos (1 photo of 1 skein)').waitFor();
    await panel.getByText('Pim Shellgrove').waitFor();
    await saveScreenshot(page, 'console-storage-desktop');
    expect(problems).toEqual([]);
    await context.close();
  });
});
