import { randomUUID } from 'node:crypto';
import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ApiPerson, created } from '../support/api.ts';
import { appOrigin, launchBrowser, newContext, watchPage } from '../support/browser.ts';
import { makeLiveMonth, type LiveMonth } from '../support/live-month.ts';

// The viewer's landing pages arrive with their first HTML written by the server, and the
// browser takes that HTML over (hydration) instead of drawing the page again.

const studioName = `Saltmarsh Test Studio ${randomUUID().slice(0, 6)}`;
const slug = studioName.toLowerCase().replace(/\s+/g, '-');
// Markup, a script end tag and replacement patterns ("$&") in what a host types: the page must
// show it as text and run none of it.
const tagline = 'Dyed at <b>low</b> tide </script><script>window.__taken=1</script> $& $1';
let browser: Browser;
let host: ApiPerson;
let month: LiveMonth;

beforeAll(async () => {
  host = await ApiPerson.signUp('first-html-host', 'Wren Saltmarsh');
  await created(
    await host.call('POST', '/api/studios', {
      name: studioName,
      slug,
      tagline,
      accentHex: '#2a6f5f',
    }),
  );
  month = await makeLiveMonth(host, slug);
  browser = await launchBrowser();
}, 120_000);

afterAll(async () => {
  await browser?.close();
});

const studioPath = () => `/s/${slug}`;
const dyeAlongPath = () => `/s/${slug}/dye-alongs/${month.dyeAlongId}`;
const rootOf = (html: string) => html.slice(html.indexOf('<div id="root">'));

describe('a landing page over plain HTTP', () => {
  it("carries the studio's page in its HTML, its answers as data, and no inline script", async () => {
    const res = await fetch(`${appOrigin}${studioPath()}`);
    expect(res.status).toBe(200);
    expect(res.headers.get('cache-control')).toBe('no-cache');
    const html = await res.text();
    const root = rootOf(html);
    expect(root).toContain(studioName);
    expect(root).toContain(month.title);
    // React writes text escaped (HTML Living Standard, "serializing HTML fragments").
    expect(root).toContain('Dyed at &lt;b&gt;low&lt;/b&gt; tide &lt;/script&gt;');
    expect(root).toContain('$&amp; $1');
    // The answers ride in a JSON data block; "<" is escaped so no text can end the element.
    const data = html.match(
      /<script type="application\/json" id="vatside-first-html">([^<]*)<\/script>/,
    );
    expect(data, 'the data block').not.toBeNull();
    expect(data![1]).toContain('\\u003c/script>');
    expect(JSON.stringify(JSON.parse(data![1]!))).toContain(tagline);
    // Every script is a file or a data block: the content security policy allows no other.
    for (const tag of html.match(/<script[^>]*>/g) ?? []) {
      expect(tag).toMatch(/ src="|type="application\/json"/);
    }
  });

  it('answers an address with no page with 404 and the not-found screen written', async () => {
    const res = await fetch(`${appOrigin}/s/${slug}/no-such-page/here`);
    expect(res.status).toBe(404);
    expect(rootOf(await res.text())).toContain('There is nothing at this address.');
  });

  it("writes a signed-in person's page as theirs, and no shared cache may keep it", async () => {
    const res = await host.call('GET', studioPath());
    expect(res.status).toBe(200);
    expect(res.headers.get('cache-control')).toBe('private, no-cache');
    const root = rootOf(await res.text());
    expect(root).toContain('Wren Saltmarsh');
    expect(root).not.toContain('Sign in');
  });
});

describe('in Chromium', () => {
  it('a phone with scripts turned off still reads the dye-along page', async () => {
    const context = await browser.newContext({
      viewport: { width: 390, height: 844 },
      javaScriptEnabled: false,
    });
    const page = await context.newPage();
    await page.goto(`${appOrigin}${dyeAlongPath()}`);
    await expect(page.getByRole('heading', { level: 1 }).textContent()).resolves.toBe(month.title);
    await expect(page.getByRole('heading', { name: 'What to get' }).isVisible()).resolves.toBe(
      true,
    );
    await context.close();
  });

  it('takes the page over without drawing it again, on a phone in another time zone', async () => {
    // Far from UTC, which the server writes times in, so the phone's own clock must take over.
    const context = await newContext(browser, 'phone', 'Pacific/Auckland');
    const page = await context.newPage();
    // Counts elements removed from the page: a redrawn page replaces its elements.
    await page.addInitScript(() => {
      const seen = { removed: 0 };
      (window as unknown as { __seen: typeof seen }).__seen = seen;
      new MutationObserver((records) => {
        for (const r of records)
          r.removedNodes.forEach((node) => {
            if (node.nodeType === 1) seen.removed++;
          });
      }).observe(document, { childList: true, subtree: true });
    });
    const problems = watchPage(page);
    await page.goto(`${appOrigin}${dyeAlongPath()}`);
    await page.getByText('Your time zone: Pacific/Auckland').waitFor();
    await expect(
      page.evaluate(() => (window as unknown as { __seen: { removed: number } }).__seen.removed),
    ).resolves.toBe(0);
    await expect(page.evaluate(() => '__taken' in window)).resolves.toBe(false);
    expect(problems).toEqual([]);

    // The phone told the server its zone: the next first HTML is written in it.
    const again = await page.request.get(`${appOrigin}${dyeAlongPath()}`);
    // React separates adjacent text with an empty comment.
    expect(rootOf(await again.text())).toMatch(/Your time zone: (<!-- -->)?Pacific\/Auckland/);

    // Taken over, the page moves on without a page load.
    await page.getByRole('link', { name: 'Studios' }).click();
    await page.getByRole('heading', { name: 'Dye along at home', level: 1 }).waitFor();
    await expect(
      page.evaluate(() => performance.getEntriesByType('navigation').length),
    ).resolves.toBe(1);
    await context.close();
  });

  it("writes the follow-along's run sheets, and the socket brings the live state after", async () => {
    const { sessionId } = await created<{ sessionId: string }>(
      await host.call('POST', `/api/studios/${slug}/dye-alongs/${month.dyeAlongId}/live-sessions`, {
        mode: 'live',
      }),
    );
    const html = await (await fetch(`${appOrigin}/live/${sessionId}`)).text();
    expect(rootOf(html)).toContain('Pool Teal');
    expect(rootOf(html)).toContain('Kelp Shade');

    const context = await newContext(browser, 'phone');
    const page = await context.newPage();
    const problems = watchPage(page);
    await page.goto(`${appOrigin}/live/${sessionId}`);
    await page.getByText('Connected', { exact: true }).waitFor();
    await expect(page.getByRole('heading', { name: 'Pool Teal' }).isVisible()).resolves.toBe(true);
    expect(problems).toEqual([]);
    await context.close();
  });
});
