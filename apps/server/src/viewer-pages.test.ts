import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import type { AddressInfo } from 'node:net';
import { tmpdir } from 'node:os';
import path from 'node:path';
import express from 'express';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createLogger } from './logger.ts';
import { viewerPages } from './viewer-pages.ts';

// The page handler with a stand-in for the viewer's server build: how it writes a first HTML
// into the shell, and when it sends the plain shell instead. (The real build is covered end to
// end in tests/e2e/first-html.test.ts.)

const shell = '<!doctype html><html><body><div id="root"></div><script src="/a.js"></script>';

/** A viewer build whose entry-server.js answers by the page's path. */
const entryServer = `
export const FIRST_HTML_DATA_ID = 'first-data';
export async function renderFirstHtml({ url, forwardHeaders, apiOrigin }) {
  if (url === '/broken') throw new Error('render failed');
  if (url === '/slow') return new Promise(() => {});
  if (url === '/not-written') return null;
  const asked = JSON.stringify({ forwardHeaders, apiOrigin });
  return { status: url === '/gone' ? 404 : 200, html: '<h1>Tide $& pool</h1>', dataJson: asked };
}`;

let dir: string;
let origin: string;
let close: () => void;

beforeAll(async () => {
  dir = mkdtempSync(path.join(tmpdir(), 'viewer-pages-'));
  mkdirSync(path.join(dir, 'dist'));
  mkdirSync(path.join(dir, 'dist-server'));
  writeFileSync(path.join(dir, 'dist', 'index.html'), shell);
  writeFileSync(path.join(dir, 'dist-server', 'entry-server.js'), entryServer);
  const app = express();
  app.set('trust proxy', 'loopback');
  app.get(
    '/{*rest}',
    viewerPages(path.join(dir, 'dist'), createLogger({ LOG_LEVEL: 'silent' }), 300),
  );
  const server = app.listen(0, '127.0.0.1');
  await new Promise((resolve) => server.once('listening', resolve));
  origin = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  close = () => server.close();
});

afterAll(() => {
  close?.();
  rmSync(dir, { recursive: true, force: true });
});

describe('viewer pages', () => {
  it('writes the first HTML into #root and its answers into a data block after it', async () => {
    const res = await fetch(`${origin}/s/tide`, { headers: { cookie: 'session=abc' } });
    expect(res.status).toBe(200);
    expect(res.headers.get('cache-control')).toBe('private, no-cache');
    const html = await res.text();
    // "$&" stays as written: String.replace would otherwise put the matched text there.
    expect(html).toContain('<div id="root"><h1>Tide $& pool</h1></div>');
    const data = html.match(/<script type="application\/json" id="first-data">(.*?)<\/script>/);
    const asked = JSON.parse(data![1]!) as {
      forwardHeaders: Record<string, string>;
      apiOrigin: string;
    };
    // The API is asked on the asker's behalf, on the address the request came in on.
    expect(asked.forwardHeaders).toEqual({ cookie: 'session=abc', 'x-forwarded-for': '127.0.0.1' });
    expect(asked.apiOrigin).toBe(origin);
  });

  it('answers with the status the page names', async () => {
    expect((await fetch(`${origin}/gone`)).status).toBe(404);
  });

  it.each([
    ['the page is not one written on the server', '/not-written'],
    ['writing it fails', '/broken'],
    ['writing it takes longer than the time limit', '/slow'],
  ])('sends the plain shell when %s', async (_case, url) => {
    const res = await fetch(`${origin}${url}`);
    expect(res.status).toBe(200);
    expect(res.headers.get('cache-control')).toBe('no-cache');
    await expect(res.text()).resolves.toBe(shell);
  });
});
