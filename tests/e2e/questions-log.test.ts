import { randomUUID } from 'node:crypto';
import type { Browser, BrowserContext } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ApiPerson } from '../support/api.ts';
import {
  launchBrowser,
  newContext,
  saveScreenshot,
  signInThroughForm,
  watchPage,
} from '../support/browser.ts';
import { makeLiveMonth } from '../support/live-month.ts';

let browser: Browser;
let host: ApiPerson;
let asker: ApiPerson;
let echo: ApiPerson;
let moderator: ApiPerson;
const slug = `e2e-qlog-${randomUUID().slice(0, 8)}`;

beforeAll(async () => {
  browser = await launchBrowser();
  [host, asker, echo, moderator] = await Promise.all([
    ApiPerson.signUp('e2e-qlog-host', 'Oriel Saltmarsh'),
    ApiPerson.signUp('e2e-qlog-asker', 'Pim Driftwood'),
    ApiPerson.signUp('e2e-qlog-echo', 'Juno Bramblecot'),
    ApiPerson.signUp('e2e-qlog-mod', 'Tamsin Reedbank'),
  ]);
  const studio = await host.call('POST', '/api/studios', {
    name: 'Saltmarsh Test Dyeworks',
    slug,
    accentHex: '#2f5d8a',
  });
  expect(studio.status).toBe(201);
  await makeLiveMonth(host, slug);
  for (const person of [asker, echo, moderator]) {
    const followed = await person.call('PUT', `/api/studios/${slug}/follow`, { mailOptIn: false });
    expect(followed.status).toBe(200);
  }
  const promoted = await host.call('PATCH', `/api/studios/${slug}/members/${moderator.userId}`, {
    role: 'moderator',
  });
  expect(promoted.status).toBe(200);
}, 60_000);

afterAll(() => browser?.close());

async function phoneFor(person: ApiPerson, sessionId: string) {
  const context = await newContext(browser, 'phone');
  const page = await context.newPage();
  const problems = watchPage(page);
  await signInThroughForm(page, person, 'viewer', `/live/${sessionId}`);
  const questions = page.getByRole('region', { name: 'Questions' });
  await questions.getByLabel('Your question to the host').waitFor();
  return { context, page, problems, questions };
}

describe('the dye log and the question queue during a live session', () => {
  it('logs an adjusted amount; viewers ask and add “me too”; a moderator answers', async () => {
    const contexts: BrowserContext[] = [];
    const hostContext = await newContext(browser, 'desktop');
    contexts.push(hostContext);
    const board = await hostContext.newPage();
    const hostProblems = watchPage(board);
    await signInThroughForm(board, host, 'console', `/studios/${slug}/live`);
    await board
      .getByRole('article', { name: 'Tide pool month' })
      .getByRole('button', { name: 'Go live' })
      .click();

    // The host logs the teal stock adjusted: 90 mL instead of the planned 100 mL.
    const log = board.getByRole('region', { name: 'Dye log · Pool Teal' });
    await log.getByRole('button', { name: /^Adjust / }).click();
    const amount = log.getByLabel(/^Amount of .* that went in \(mL\)$/);
    await amount.fill('90');
    await log.getByRole('button', { name: 'Log', exact: true }).click();
    await log.getByRole('list', { name: 'Logged for Pool Teal' }).getByText('adjusted').waitFor();
    await saveScreenshot(board, 'questions-log-host-dye-log');

    const sessionId = /\/live\/([0-9a-f-]{36})/.exec(board.url())?.[1] ?? '';
    expect(sessionId).not.toBe('');
    const logged = await host.call('GET', `/api/live-sessions/${sessionId}/dye-log`);
    expect(logged.status).toBe(200);
    const { entries } = (await logged.json()) as {
      entries: { amount: number; asPlanned: boolean; unit: string }[];
    };
    expect(entries).toEqual([
      expect.objectContaining({ amount: 90, asPlanned: false, unit: 'mL' }),
    ]);

    // One viewer asks; the other adds "me too".
    const first = await phoneFor(asker, sessionId);
    const second = await phoneFor(echo, sessionId);
    contexts.push(first.context, second.context);
    const text = 'Can I use citric acid instead of vinegar?';
    await first.questions.getByLabel('Your question to the host').fill(text);
    await first.questions.getByRole('button', { name: 'Send question' }).click();
    await first.questions.getByText('You asked', { exact: false }).waitFor();
    await second.questions.getByRole('button', { name: `Me too: ${text}` }).click();
    await second.questions.getByText('✓ Me too added').waitFor();
    await first.questions.getByText('1 “me too”', { exact: false }).waitFor();
    await saveScreenshot(second.page, 'questions-log-viewer-me-too');

    // The moderator answers from the console's question page.
    const modContext = await newContext(browser, 'desktop');
    contexts.push(modContext);
    const desk = await modContext.newPage();
    const modProblems = watchPage(desk);
    await signInThroughForm(
      desk,
      moderator,
      'console',
      `/studios/${slug}/live/${sessionId}/questions`,
    );
    const row = desk.getByRole('listitem', { name: 'Question from Pim Driftwood' });
    await row.getByText('1 “me too”', { exact: false }).waitFor();
    await row.getByLabel('Short answer (optional)').fill('Yes: about a teaspoon per skein.');
    await row.getByRole('button', { name: 'Mark answered' }).click();
    await row.getByText('Answered', { exact: false }).waitFor();
    await saveScreenshot(desk, 'questions-log-moderator-queue');

    for (const phone of [first, second]) {
      await phone.questions.getByText('Yes: about a teaspoon per skein.').waitFor();
    }
    await saveScreenshot(first.page, 'questions-log-viewer-answer');
    // The host's board shows the same queue.
    await board
      .getByRole('region', { name: 'Questions' })
      .getByText('Yes: about a teaspoon per skein.', { exact: false })
      .waitFor();

    expect(hostProblems).toEqual([]);
    expect(modProblems).toEqual([]);
    expect(first.problems).toEqual([]);
    expect(second.problems).toEqual([]);
    for (const context of contexts) await context.close();
  }, 150_000);
});
