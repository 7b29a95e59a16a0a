import { chromium } from 'playwright-core';
import { readFileSync } from 'node:fs';
const [src, out, x, y, w, h, scale] = process.argv.slice(2);
const b = await chromium.launch({ executablePath: '/usr/bin/chromium', args: ['--no-sandbox'] });
const p = await b.newPage({ viewport: { width: Number(w), height: Number(h) }, deviceScaleFactor: Number(scale ?? 1) });
const data = readFileSync(src).toString('base64');
await p.setContent(`<body style="margin:0"><img style="position:absolute;left:-${x}px;top:-${y}px" src="data:image/png;base64,${data}"></body>`);
await p.screenshot({ path: out });
await b.close();
