import { existsSync } from 'node:fs';
import path from 'node:path';
import compression from 'compression';
import express, { type Express } from 'express';
import type { Logger } from './logger.ts';
import { viewerPages } from './viewer-pages.ts';

/**
 * Serves the built apps from one origin: the console under /console/, the viewer at /.
 * Hashed assets are cached for a year; the HTML pages are never cached. Both are gzipped: on a
 * phone's mobile connection the viewer's scripts shrink to about a third. The viewer's landing
 * pages go out with their first HTML written (viewer-pages.ts).
 */
export function serveApps(app: Express, appsDir: string, logger: Logger): void {
  const mounts = [
    { prefix: '/console', dist: path.join(appsDir, 'console', 'dist') },
    { prefix: '/', dist: path.join(appsDir, 'viewer', 'dist') },
  ];
  for (const { prefix, dist } of mounts) {
    if (!existsSync(path.join(dist, 'index.html'))) continue;
    app.use(
      prefix,
      compression(),
      express.static(dist, {
        index: false,
        setHeaders(res, file) {
          res.setHeader(
            'Cache-Control',
            file.includes(`${path.sep}assets${path.sep}`)
              ? 'public, max-age=31536000, immutable'
              : 'no-cache',
          );
        },
      }),
    );
    if (prefix === '/') {
      app.get('/{*rest}', compression(), viewerPages(dist, logger));
      continue;
    }
    const shell = path.join(dist, 'index.html');
    app.get(`${prefix}{/*rest}`, compression(), (_req, res) => {
      res.setHeader('Cache-Control', 'no-cache');
      res.sendFile(shell);
    });
  }
}
