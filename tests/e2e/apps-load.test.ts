import { randomUUID } from 'node:crypto';
import { eq } from '@vatside/db/sql';
import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { studios } from '@vatside/db/schema';
import {
  appOrigin,
  launchBrowser,
  newContext,
  saveScreenshot,
  watchPage,
  viewports,
} from '../support/browser.ts';
import { testDatabase } from '../support/database.ts';

const database = testDatabase();
const studioName = `Brinefoot Test Studio ${randomUUID().slice(0, 6)}`;
const slug = studioName.toLowerCase().replace(/\s+/g, '-');
let browser: Browser;

beforeAll(async () => {
  await database.db
    .insert(studios)
    .values({ slug, name: studioName, tagline: 'Made by the e2e test.', accentHex: '#2a6f5f' });
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
  await database.db.delete(studios).where(eq(studios.slug, slug));
  await database.close();
});

const apps = [
  { app: 'viewer', path: '/' },
  { app: 'console', path: '/console/' },
] as const;

describe.each(apps)('the $app app loads in Chromium', ({ app, path }) => {
  it.each(Object.keys(viewports) as (keyof typeof viewports)[])(
    'at a %s viewport, with data from the API, no console errors and nothing leaving loopback',
    async (viewport) => {
      const context = await newContext(browser, viewport);
      const page = await context.newPage();
      const problems = watchPage(page);
      await page.goto(`${appOrigin}${path}`);
      await page.getByText(studioName).first().waitFor({ timeout: 15_000 });
      await expect(page.title()).resolves.toMatch(/Vatside/);
      await saveScreenshot(page, `foundation-${app}-${viewport}`);
      expect(problems).toEqual([]);
      await context.close();
    },
  );
});

describe('a deep link into each app is served its shell', () => {
  // The viewer writes its not-found page on the server, with the status to match; the console's
  // shell draws its own in the browser.
  const withStatus = [
    { ...apps[0], status: 404 },
    { ...apps[1], status: 200 },
  ];
  it.each(withStatus)(
    '$app answers an unknown page with its own not-found screen',
    async ({ path, status }) => {
      const context = await newContext(browser, 'phone');
      const page = await context.newPage();
      const response = await page.goto(`${appOrigin}${path}no-such-page`);
      expect(response?.status()).toBe(status);
      await page.getByRole('heading').first().waitFor();
      await expect(
        page
          .getByText(/nothing at this address/i)
          .first()
          .isVisible(),
      ).resolves.toBe(true);
      await context.close();
    },
  );
});
