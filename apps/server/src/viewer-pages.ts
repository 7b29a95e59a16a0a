import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import type { Request, RequestHandler } from 'express';
import type { Logger } from './logger.ts';

// The viewer's pages. A landing page goes out with its first HTML already written (by the
// viewer's own server build, apps/viewer/src/entry-server.tsx), so a phone on a slow connection
// paints it before the scripts arrive; every other page, and any page whose first HTML cannot
// be written in time, goes out as the plain shell that the scripts fill in.

/** What the viewer's dist-server/entry-server.js exports. */
interface FirstHtmlModule {
  FIRST_HTML_DATA_ID: string;
  renderFirstHtml(request: {
    url: string;
    forwardHeaders: Record<string, string>;
    apiOrigin: string;
  }): Promise<{ status: number; html: string; dataJson: string } | null>;
}

/** Past this the plain shell goes out: a slow API should not hold the page back. */
const FIRST_HTML_TIME_LIMIT_MS = 2_000;

const ROOT = '<div id="root"></div>';

/** The server as the request reached it: its own API, on the same address and port. */
function ownOrigin(req: Request): string {
  const address = req.socket.localAddress ?? '127.0.0.1';
  const host = address.includes(':') ? `[${address}]` : address;
  return `http://${host}:${req.socket.localPort}`;
}

function timeLimit(ms: number): Promise<null> {
  return new Promise((resolve) => setTimeout(() => resolve(null), ms).unref());
}

export function viewerPages(
  dist: string,
  logger: Logger,
  timeLimitMs = FIRST_HTML_TIME_LIMIT_MS,
): RequestHandler {
  const shellPath = path.join(dist, 'index.html');
  const shell = readFileSync(shellPath, 'utf8');
  if (!shell.includes(ROOT)) throw new Error(`${shellPath} has no ${ROOT}`);
  const entry = path.join(path.dirname(dist), 'dist-server', 'entry-server.js');
  const firstHtml = existsSync(entry)
    ? (import(pathToFileURL(entry).href) as Promise<FirstHtmlModule>)
    : null;

  return async (req, res) => {
    const cookie = req.headers.cookie;
    // A signed-in person's page carries their own details: no shared cache may keep it.
    res.setHeader('Cache-Control', cookie ? 'private, no-cache' : 'no-cache');
    res.setHeader('Vary', 'Cookie');
    const page = firstHtml
      ? await firstHtml
          .then((module) =>
            Promise.race([
              module
                .renderFirstHtml({
                  url: req.originalUrl,
                  // The API sees the asker: their session, and their address for rate limits
                  // (the server trusts X-Forwarded-For from loopback, where these calls come from).
                  forwardHeaders: {
                    ...(cookie ? { cookie } : {}),
                    'x-forwarded-for': req.ip ?? '',
                  },
                  apiOrigin: ownOrigin(req),
                })
                .then((written) => written && { ...written, dataId: module.FIRST_HTML_DATA_ID }),
              timeLimit(timeLimitMs),
            ]),
          )
          .catch((error: unknown) => {
            logger.warn({ err: error, url: req.originalUrl }, 'first HTML failed: sent the shell');
            return null;
          })
      : null;
    if (!page) {
      res.type('html').send(shell);
      return;
    }
    res
      .status(page.status)
      .type('html')
      .send(
        // A function, so "$&" and the like in the page's text stay as written.
        shell.replace(
          ROOT,
          () =>
            `<div id="root">${page.html}</div><script type="application/json" id="${page.dataId}">${page.dataJson}</script>`,
        ),
      );
  };
}
