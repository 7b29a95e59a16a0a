import { existsSync } from 'node:fs';
import path from 'node:path';
import compression from 'compression';
import express, { type Express } from 'express';

/**
 * Serves the built apps from one origin: the console under /console/, the viewer at /.
 * Hashed assets are cached for a year; the HTML shells are never cached. Both are gzipped: on a
 * phone's mobile connection the viewer's scripts shrink to about a third.
 */
export function serveApps(app: Express, appsDir: string): void {
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
    const shell = path.join(dist, 'index.html');
    const pattern = prefix === '/' ? '/{*rest}' : `${prefix}{/*rest}`;
    app.get(pattern, compression(), (_req, res) => {
      res.setHeader('Cache-Control', 'no-cache');
      res.sendFile(shell);
    });
  }
}
