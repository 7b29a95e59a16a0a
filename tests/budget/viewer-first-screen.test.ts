import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import {
  FIRST_SCREEN_JS_BUDGET_BYTES,
  kb,
  readViewerManifest,
  routeJs,
  viewerDist,
  viewerLandingRoutes,
} from '../support/viewer-bundle.ts';
import { appOrigin } from '../support/browser.ts';

// A check on the built viewer (npm test builds the apps before running the tests), not a timing:
// the JavaScript a phone must download before the first screen stays within the budget of
// issue #11 (150 KB gzip, our own target), and the heavy parts stay out of it.

const manifest = readViewerManifest();
const welcome = viewerLandingRoutes.find((r) => r.name === 'welcome')!;
const liveFollow = viewerLandingRoutes.find((r) => r.name === 'live follow-along')!;
const firstScreen = routeJs(manifest, welcome);

describe("the viewer's first screen", () => {
  it(`ships at most ${kb(FIRST_SCREEN_JS_BUDGET_BYTES)} of JavaScript, gzip`, () => {
    expect(
      firstScreen.gzipBytes,
      `${kb(firstScreen.gzipBytes)} in ${firstScreen.files.join(', ')}`,
    ).toBeLessThanOrEqual(FIRST_SCREEN_JS_BUDGET_BYTES);
  });

  it('leaves the live follow-along and its socket client to the routes that use them', () => {
    const liveChunk = manifest[liveFollow.module]!.file;
    expect(firstScreen.files).not.toContain(liveChunk);
    for (const file of firstScreen.files) {
      // engine.io is socket.io-client's transport (socket.io protocol, common knowledge).
      expect(readFileSync(path.join(viewerDist, file), 'utf8'), file).not.toContain('engine.io');
    }
  });

  it("never carries the console's code", () => {
    const sources = Object.entries(manifest).map(([key, chunk]) => chunk.src ?? key);
    expect(
      sources.filter((s) => s.includes('apps/console') || s.startsWith('../console/')),
    ).toEqual([]);
  });

  it('counts every landing route from the same manifest (the bench prints them all)', () => {
    for (const route of viewerLandingRoutes) {
      const js = routeJs(manifest, route);
      // Every route loads the first screen's entry chunk and adds its own module.
      expect(js.files, route.name).toEqual(expect.arrayContaining([firstScreen.files[0]!]));
      expect(js.files, route.name).toContain(manifest[route.module]!.file);
    }
  });

  it('is served compressed to a phone that accepts gzip (the size the budget counts)', async () => {
    const entry = firstScreen.files[0]!;
    const res = await fetch(`${appOrigin}/${entry}`, { headers: { 'Accept-Encoding': 'gzip' } });
    expect(res.status).toBe(200);
    // Content-Encoding names the coding applied to the body (RFC 9110, §8.4).
    expect(res.headers.get('content-encoding')).toBe('gzip');
  });
});
