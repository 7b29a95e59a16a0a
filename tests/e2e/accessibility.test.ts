import { randomUUID } from 'node:crypto';
import { writeFileSync, mkdirSync } from 'node:fs';
import path from 'node:path';
import axe from 'axe-core';
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ApiPerson } from '../support/api.ts';
import { appOrigin, launchBrowser, newContext, watchPage } from '../support/browser.ts';
import { encodePng } from '../support/images.ts';
import { makeLiveMonth } from '../support/live-month.ts';

// axe-core (Deque's rules for WCAG 2.0/2.1/2.2 A and AA) run inside every screen of both apps,
// as a visitor, a following viewer and the host, at the sizes each app is built for. A serious
// or critical violation fails the test; the full report lands beside the other test artefacts.

const wcagTags = ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa', 'wcag22aa'];
const resultsDir = process.env.VATSIDE_TEST_RESULTS ?? path.resolve('.local/test/results');

interface Screen {
  /** What a reader of a failure needs to find the screen. */
  name: string;
  path: string;
  as: 'visitor' | 'viewer' | 'host';
  viewport: 'phone' | 'desktop';
  /** The page's HTTP status when it is not 200; Chromium logs that status as a console error. */
  status?: 404;
}

let browser: Browser;
let host: ApiPerson;
let viewer: ApiPerson;
const slug = `e2e-axe-${randomUUID().slice(0, 8)}`;
let dyeAlongId = '';
let colorwayId = '';
let sessionId = '';
let skeinId = '';

beforeAll(async () => {
  browser = await launchBrowser();
  host = await ApiPerson.signUp('e2e-axe-host', 'Isolde Wrackline');
  viewer = await ApiPerson.signUp('e2e-axe-viewer', 'Pell Strand');
  const studio = await host.call('POST', '/api/studios', {
    name: 'Wrackline Contrast Works',
    slug,
    accentHex: '#1f6f78',
  });
  expect(studio.status).toBe(201);
  ({ dyeAlongId } = await makeLiveMonth(host, slug));
  const colorways = (await (await host.call('GET', `/api/studios/${slug}/colorways`)).json()) as {
    items: { id: string }[];
  };
  colorwayId = colorways.items[0]!.id;
  expect((await viewer.call('PUT', `/api/studios/${slug}/follow`, { mailOptIn: false })).ok).toBe(
    true,
  );
  const live = await host.call(
    'POST',
    `/api/studios/${slug}/dye-alongs/${dyeAlongId}/live-sessions`,
    { mode: 'live' },
  );
  expect(live.status).toBe(201);
  ({ sessionId } = (await live.json()) as { sessionId: string });

  // A shared skein, approved and featured, so the gallery, the queue and the recap have one.
  const opened = await host.call('PATCH', `/api/studios/${slug}/dye-alongs/${dyeAlongId}`, {
    shareOpensAt: new Date(Date.now() - 60_000).toISOString(),
  });
  expect(opened.status).toBe(200);
  const form = new FormData();
  form.append(
    'details',
    JSON.stringify({ baseName: 'Tidewrack Sock', dyesUsed: ['teal gel'], consentToFeature: true }),
  );
  const photo = encodePng(160, 120, (x) => (x < 120 ? [31, 111, 120] : [232, 228, 220]));
  form.append('photos', new Blob([new Uint8Array(photo)], { type: 'image/png' }), 'skein.png');
  const shared = await viewer.call(
    'POST',
    `/api/studios/${slug}/dye-alongs/${dyeAlongId}/submissions`,
    form,
  );
  expect(shared.status).toBe(201);
  ({ id: skeinId } = (await shared.json()) as { id: string });
  const featured = await host.call(
    'POST',
    `/api/studios/${slug}/review/submissions/${skeinId}/decisions`,
    { decision: 'feature' },
  );
  expect(featured.status).toBe(200);
  const recap = await host.call('PUT', `/api/studios/${slug}/dye-alongs/${dyeAlongId}/recap`, {
    items: [{ submissionId: skeinId, note: 'Dyed on a camp stove.' }, { colorwayId }],
  });
  expect(recap.status, await recap.clone().text()).toBe(200);
});

afterAll(() => browser?.close());

function screens(): Screen[] {
  const studio = `/console/studios/${slug}`;
  const month = `/s/${slug}/dye-alongs/${dyeAlongId}`;
  const viewerScreens: Screen[] = [
    { name: 'welcome', path: '/', as: 'visitor', viewport: 'phone' },
    { name: 'sign in', path: '/sign-in', as: 'visitor', viewport: 'phone' },
    { name: 'sign up', path: '/sign-up', as: 'visitor', viewport: 'phone' },
    { name: 'forgot password', path: '/forgot-password', as: 'visitor', viewport: 'phone' },
    { name: 'studio page', path: `/s/${slug}`, as: 'visitor', viewport: 'phone' },
    { name: 'dye-along page', path: month, as: 'viewer', viewport: 'phone' },
    { name: 'live follow-along', path: `/live/${sessionId}`, as: 'viewer', viewport: 'phone' },
    { name: 'profile', path: '/profile', as: 'viewer', viewport: 'phone' },
    { name: 'share a skein', path: `${month}/share`, as: 'viewer', viewport: 'phone' },
    { name: 'my skeins', path: `/s/${slug}/my-skeins`, as: 'viewer', viewport: 'phone' },
    { name: 'gallery', path: `${month}/gallery`, as: 'visitor', viewport: 'phone' },
    {
      name: 'a skein in the gallery',
      path: `${month}/gallery/${skeinId}`,
      as: 'visitor',
      viewport: 'phone',
    },
    { name: 'not found', path: '/no-such-page', as: 'visitor', viewport: 'phone', status: 404 },
  ];
  const consoleScreens: Screen[] = [
    { name: 'studio desk', path: '/console/', as: 'host', viewport: 'desktop' },
    { name: 'members', path: `${studio}/members`, as: 'host', viewport: 'desktop' },
    { name: 'dye shelf', path: `${studio}/shelf`, as: 'host', viewport: 'desktop' },
    { name: 'bases and pots', path: `${studio}/bases`, as: 'host', viewport: 'desktop' },
    { name: 'colorways', path: `${studio}/colorways`, as: 'host', viewport: 'desktop' },
    {
      name: 'colorway editor',
      path: `${studio}/colorways/${colorwayId}`,
      as: 'host',
      viewport: 'desktop',
    },
    { name: 'calculators', path: `${studio}/calculators`, as: 'host', viewport: 'desktop' },
    { name: 'inspiration', path: `${studio}/inspiration`, as: 'host', viewport: 'desktop' },
    { name: 'dye-alongs', path: `${studio}/dye-alongs`, as: 'host', viewport: 'desktop' },
    { name: 'new dye-along', path: `${studio}/dye-alongs/new`, as: 'host', viewport: 'desktop' },
    {
      name: 'dye-along planning',
      path: `${studio}/dye-alongs/${dyeAlongId}`,
      as: 'host',
      viewport: 'desktop',
    },
    {
      name: 'recipe card',
      path: `${studio}/dye-alongs/${dyeAlongId}/recipe-card/${colorwayId}`,
      as: 'host',
      viewport: 'desktop',
    },
    { name: 'stovetop', path: `${studio}/live`, as: 'host', viewport: 'desktop' },
    { name: 'pot board', path: `${studio}/live/${sessionId}`, as: 'host', viewport: 'desktop' },
    {
      name: 'question queue',
      path: `${studio}/live/${sessionId}/questions`,
      as: 'host',
      viewport: 'desktop',
    },
    { name: 'start a studio', path: '/console/studios/new', as: 'host', viewport: 'desktop' },
    {
      name: 'review queue',
      path: `${studio}/review?status=featured`,
      as: 'host',
      viewport: 'desktop',
    },
    { name: 'review audit', path: `${studio}/review/audit`, as: 'host', viewport: 'desktop' },
    {
      name: 'recap running order',
      path: `${studio}/dye-alongs/${dyeAlongId}/recap`,
      as: 'host',
      viewport: 'desktop',
    },
    {
      name: 'recap presenter',
      path: `${studio}/dye-alongs/${dyeAlongId}/presenter`,
      as: 'host',
      viewport: 'desktop',
    },
    {
      name: 'presenter notes',
      path: `${studio}/dye-alongs/${dyeAlongId}/presenter/notes`,
      as: 'host',
      viewport: 'desktop',
    },
    {
      name: 'bath records',
      path: `${studio}/dye-alongs/${dyeAlongId}/bath-records`,
      as: 'host',
      viewport: 'desktop',
    },
    { name: 'archive', path: `${studio}/archive`, as: 'host', viewport: 'desktop' },
  ];
  return [...viewerScreens, ...consoleScreens];
}

const contexts = new Map<string, BrowserContext>();

async function contextFor(screen: Screen): Promise<BrowserContext> {
  const key = `${screen.as}:${screen.viewport}`;
  const known = contexts.get(key);
  if (known) return known;
  const context = await newContext(browser, screen.viewport);
  const person = screen.as === 'host' ? host : screen.as === 'viewer' ? viewer : null;
  if (person) await context.addCookies(person.browserCookies());
  contexts.set(key, context);
  return context;
}

/** Waits until the screen has settled: its heading is drawn and no loading block is left. */
async function settle(page: Page, screen: Screen): Promise<void> {
  await page
    .locator('h1')
    .first()
    .waitFor({ timeout: 15_000 })
    .catch(() => {
      throw new Error(`${screen.name} (${screen.path}) drew no h1 within 15 s`);
    });
  await page.waitForFunction(() => !document.querySelector('[aria-busy="true"]'), undefined, {
    timeout: 15_000,
  });
}

async function axeViolations(page: Page) {
  // Evaluated through the DevTools protocol, which the app's Content-Security-Policy allows.
  await page.evaluate(axe.source);
  return page.evaluate(async (tags) => {
    const result = await window.axe.run(document, { runOnly: { type: 'tag', values: tags } });
    return result.violations.map((v) => ({
      id: v.id,
      impact: v.impact,
      help: v.help,
      targets: v.nodes.slice(0, 5).map((n) => n.target.join(' ')),
    }));
  }, wcagTags);
}

declare global {
  interface Window {
    axe: typeof axe;
  }
}

describe('accessibility: axe-core on every screen of both apps', () => {
  it('finds no serious or critical WCAG 2.2 A/AA violation', async () => {
    const report: Record<string, unknown> = {};
    const failures: string[] = [];
    for (const screen of screens()) {
      const page = await (await contextFor(screen)).newPage();
      const problems = watchPage(page);
      const response = await page.goto(`${appOrigin}${screen.path}`);
      expect(response?.status(), screen.name).toBe(screen.status ?? 200);
      await settle(page, screen);
      const violations = await axeViolations(page);
      report[screen.name] = violations;
      for (const v of violations) {
        if (v.impact === 'serious' || v.impact === 'critical') {
          failures.push(`${screen.name} (${screen.path}): ${v.id} — ${v.help} at ${v.targets}`);
        }
      }
      const ownStatus = `the server responded with a status of ${screen.status}`;
      expect(
        problems.filter((p) => !(screen.status && p.includes(ownStatus))),
        screen.name,
      ).toEqual([]);
      await page.close();
    }
    mkdirSync(resultsDir, { recursive: true });
    writeFileSync(path.join(resultsDir, 'axe-report.json'), JSON.stringify(report, null, 2));
    expect(failures).toEqual([]);
  }, 420_000);
});

afterAll(async () => {
  for (const context of contexts.values()) await context.close();
});
