import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';

export const appOrigin = process.env.PUBLIC_ORIGIN ?? 'http://127.0.0.1:4500';
const resultsDir = process.env.VATSIDE_TEST_RESULTS ?? path.resolve('.local/test/results');

export const viewports = {
  desktop: { width: 1280, height: 800 },
  phone: { width: 390, height: 844 },
} as const;

/** One Debian Chromium per test file; each test opens its own contexts. */
export function launchBrowser(): Promise<Browser> {
  return chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    args: [
      '--no-sandbox',
      '--disable-dev-shm-usage',
      '--disable-background-networking',
      '--disable-component-update',
    ],
  });
}

export async function newContext(
  browser: Browser,
  viewport: keyof typeof viewports,
  /** The device's clock, e.g. "Asia/Tokyo"; the host machine's zone when left out. */
  timezoneId?: string,
): Promise<BrowserContext> {
  return browser.newContext({
    viewport: viewports[viewport],
    isMobile: viewport === 'phone',
    hasTouch: viewport === 'phone',
    deviceScaleFactor: viewport === 'phone' ? 2 : 1,
    ...(timezoneId ? { timezoneId } : {}),
  });
}

/** Records console errors, uncaught page errors and any request that leaves loopback. */
export function watchPage(page: Page) {
  const problems: string[] = [];
  page.on('console', (msg) => {
    if (msg.type() === 'error') problems.push(`console error: ${msg.text()}`);
  });
  page.on('pageerror', (err) => problems.push(`page error: ${err.message}`));
  page.on('request', (req) => {
    const url = new URL(req.url());
    if (url.protocol === 'data:' || url.protocol === 'blob:') return;
    if (!['127.0.0.1', 'localhost', '[::1]'].includes(url.hostname)) {
      problems.push(`request left loopback: ${req.url()}`);
    }
  });
  return problems;
}

export async function saveScreenshot(page: Page, name: string): Promise<void> {
  mkdirSync(resultsDir, { recursive: true });
  await page.screenshot({ path: path.join(resultsDir, `${name}.png`), fullPage: true });
}

/** Signs in through the app's own form, which then lands on `next` (a path inside that app). */
export async function signInThroughForm(
  page: Page,
  person: { email: string; password: string },
  app: 'console' | 'viewer',
  next: string,
): Promise<void> {
  const root = app === 'console' ? `${appOrigin}/console` : appOrigin;
  await page.goto(`${root}/sign-in?next=${encodeURIComponent(next)}`);
  await page.getByLabel('E-mail').fill(person.email);
  await page.getByLabel('Password').fill(person.password);
  await page.getByRole('button', { name: 'Sign in' }).click();
}
