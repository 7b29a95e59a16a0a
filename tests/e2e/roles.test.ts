import { randomUUID } from 'node:crypto';
import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ApiPerson, firstLink, uniqueEmail, waitForMail } from '../support/api.ts';
import {
  appOrigin,
  launchBrowser,
  newContext,
  saveScreenshot,
  watchPage,
} from '../support/browser.ts';

let browser: Browser;
let host: ApiPerson;
let member: ApiPerson;
const slug = `e2e-roles-${randomUUID().slice(0, 8)}`;
const studioName = 'Shinglebay Test Dyeworks';

beforeAll(async () => {
  browser = await launchBrowser();
  [host, member] = await Promise.all([
    ApiPerson.signUp('e2e-host', 'Hollis Tidewell'),
    ApiPerson.signUp('e2e-member', 'Maren Pebbleford'),
  ]);
  const created = await host.call('POST', '/api/studios', {
    name: studioName,
    slug,
    accentHex: '#1f6f78',
  });
  expect(created.status).toBe(201);
  expect(
    (await member.call('PUT', `/api/studios/${slug}/follow`, { mailOptIn: false })).status,
  ).toBe(200);
});

afterAll(() => browser?.close());

describe('the host changes a member’s role in the console (desktop)', () => {
  it('signs in, opens the members table, makes the viewer a moderator', async () => {
    const context = await newContext(browser, 'desktop');
    const page = await context.newPage();
    const problems = watchPage(page);
    await page.goto(
      `${appOrigin}/console/sign-in?next=${encodeURIComponent(`/studios/${slug}/members`)}`,
    );
    await page.getByLabel('E-mail').fill(host.email);
    await page.getByLabel('Password').fill(host.password);
    await page.getByRole('button', { name: 'Sign in' }).click();

    const roleSelect = page.getByRole('combobox', { name: `Role of ${member.name}` });
    await roleSelect.waitFor();
    await roleSelect.selectOption('moderator');
    await expect
      .poll(async () => {
        const res = await host.call('GET', `/api/studios/${slug}/members`);
        const { members } = (await res.json()) as { members: { userId: string; role: string }[] };
        return members.find((m) => m.userId === member.userId)?.role;
      })
      .toBe('moderator');
    await saveScreenshot(page, 'roles-console-members');
    expect(problems).toEqual([]);
    await context.close();
  });
});

describe('a new viewer signs up on a phone and follows the studio', () => {
  it('signs up, confirms from the mailed link, follows with e-mails on', async () => {
    const context = await newContext(browser, 'phone');
    const page = await context.newPage();
    const problems = watchPage(page);
    const email = uniqueEmail('e2e-phone');
    const password = `pw-${randomUUID()}`;

    await page.goto(`${appOrigin}/sign-up?next=${encodeURIComponent(`/s/${slug}`)}`);
    await page.getByLabel('Your name').fill('Wren Shorecliff');
    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Password').fill(password);
    await page.getByRole('button', { name: 'Create account' }).click();
    await page.getByRole('heading', { name: 'A link is on its way' }).waitFor();

    await page.goto(firstLink(await waitForMail(email, /confirm/i)));
    await page.goto(`${appOrigin}/s/${slug}`);
    await page.getByRole('heading', { name: studioName }).waitFor();
    await page.getByRole('button', { name: 'Follow' }).click();
    await page.getByRole('button', { name: 'Unfollow' }).waitFor();
    // A thumb lands on the switch's visible label; the checkbox inside is for screen readers.
    await page.getByText('E-mail me about dye-alongs').click();
    await expect
      .poll(() => page.getByRole('switch', { name: 'E-mail me about dye-alongs' }).isChecked())
      .toBe(true);

    await expect
      .poll(async () => {
        const res = await host.call('GET', `/api/studios/${slug}/members`);
        const { members } = (await res.json()) as {
          members: { email: string; role: string; mailOptIn: boolean }[];
        };
        return members.find((m) => m.email === email);
      })
      .toMatchObject({ role: 'viewer', mailOptIn: true });
    await saveScreenshot(page, 'roles-viewer-follow-phone');
    expect(problems).toEqual([]);
    await context.close();
  });
});
