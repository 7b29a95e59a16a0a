import { randomUUID } from 'node:crypto';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
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
const slug = `e2e-live-${randomUUID().slice(0, 8)}`;

beforeAll(async () => {
  browser = await launchBrowser();
  host = await ApiPerson.signUp('e2e-live-host', 'Isolde Wrackline');
  const studio = await host.call('POST', '/api/studios', {
    name: 'Wrackline Test Dyeworks',
    slug,
    accentHex: '#1f6f78',
  });
  expect(studio.status).toBe(201);
  await makeLiveMonth(host, slug);
});

afterAll(() => browser?.close());

/** The viewer's phone runs seven minutes slow: only the server clock can keep it right. */
const phoneSlowByMs = 7 * 60_000;

const countdownSeconds = (text: string) => {
  const [m = '0', s = '0'] = text.trim().split(':');
  return Number(m) * 60 + Number(s);
};

/** The board's pot card by its number, e.g. "Pot 1 · Pool Teal". */
const boardPot = (page: Page, number: number) =>
  page.getByRole('region', { name: new RegExp(`^Pot ${number} ·`) });

describe('a live hour: the host drives two pots, a phone with a wrong clock follows', () => {
  it('starts, advances, times; the phone sees it, drops off, comes back, reloads', async () => {
    const hostContext = await newContext(browser, 'desktop');
    const board = await hostContext.newPage();
    const hostProblems = watchPage(board);

    await board.goto(
      `${appOrigin}/console/sign-in?next=${encodeURIComponent(`/studios/${slug}/live`)}`,
    );
    await board.getByLabel('E-mail').fill(host.email);
    await board.getByLabel('Password').fill(host.password);
    await board.getByRole('button', { name: 'Sign in' }).click();
    const month = board.getByRole('article', { name: 'Tide pool month' });
    await month.waitFor();
    await saveScreenshot(board, 'live-host-stovetop');
    await month.getByRole('button', { name: 'Go live' }).click();

    await boardPot(board, 1).waitFor();
    // Pot 1 by tapping, pot 2 by keyboard.
    await boardPot(board, 1).getByRole('button', { name: 'Next step →' }).click();
    await boardPot(board, 1).getByText('Heat the bath to a simmer.').waitFor();
    await board.keyboard.press('2');
    await board.keyboard.press('n');
    await boardPot(board, 2).getByText('Stir in the moss gel.').waitFor();
    await boardPot(board, 1).getByRole('button', { name: 'Start timer' }).click();
    await boardPot(board, 1).getByRole('button', { name: 'Pause timer' }).waitFor();
    await saveScreenshot(board, 'live-host-board-desktop');

    const viewerLink = await board
      .getByRole('region', { name: 'Follow-along link' })
      .getByText(`${appOrigin}/live/`)
      .textContent();
    expect(viewerLink).toMatch(/\/live\/[0-9a-f-]{36}$/);

    const phoneContext = await newContext(browser, 'phone');
    await phoneContext.clock.install({ time: Date.now() - phoneSlowByMs });
    const phone = await phoneContext.newPage();
    const phoneProblems = watchPage(phone);
    await phone.goto(viewerLink!);

    const tealOnPhone = phone.getByRole('region', { name: 'Pool Teal' });
    await tealOnPhone.getByText('Heat the bath to a simmer.').waitFor();
    await phone
      .getByRole('region', { name: 'Kelp Shade' })
      .getByText('Stir in the moss gel.')
      .waitFor();
    // The ten-minute timer started seconds ago; a phone trusting its own clock would show 17 min.
    const timer = phone.getByRole('timer', { name: 'Pool Teal timer' });
    const shownSeconds = async () =>
      countdownSeconds((await timer.textContent())?.match(/\d+:\d\d/)?.[0] ?? '');
    await expect.poll(shownSeconds, { timeout: 15_000 }).toBeGreaterThan(9 * 60);
    await expect.poll(shownSeconds, { timeout: 15_000 }).toBeLessThanOrEqual(600);
    await saveScreenshot(phone, 'live-viewer-phone');

    // The phone drops off; meanwhile the host pauses the timer.
    await phoneContext.setOffline(true);
    await phone.getByText('Offline — reconnecting…').waitFor({ timeout: 50_000 });
    await boardPot(board, 1).getByRole('button', { name: 'Pause timer' }).click();
    await boardPot(board, 1).getByText('Paused').waitFor();
    const pausedAt = (await boardPot(board, 1).getByTestId('countdown').textContent())!.trim();

    await phoneContext.setOffline(false);
    await tealOnPhone.getByText('Paused').waitFor({ timeout: 20_000 });
    await expect.poll(() => timer.textContent(), { timeout: 15_000 }).toContain(pausedAt);

    await phone.reload();
    await tealOnPhone.getByText('Heat the bath to a simmer.').waitFor();
    await expect.poll(() => timer.textContent(), { timeout: 15_000 }).toContain(pausedAt);
    await expect.poll(() => timer.textContent(), { timeout: 15_000 }).toContain('Paused');

    // The host sees the phone among the followers.
    await board
      .getByRole('status', { name: 'Phones following' })
      .getByText('1 phone following')
      .waitFor();
    await board.setViewportSize({ width: 1024, height: 768 });
    await saveScreenshot(board, 'live-host-board-tablet');

    expect(hostProblems).toEqual([]);
    // While offline, Chromium logs each failed reconnect attempt; nothing else may appear.
    expect(phoneProblems.filter((p) => !p.includes('ERR_INTERNET_DISCONNECTED'))).toEqual([]);
    await phoneContext.close();
    await hostContext.close();
  }, 150_000);
});
