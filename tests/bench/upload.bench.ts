// pnpm bench:upload [--shares 20] [--warmup 5]
//
// One server process (a child, as `npm start` runs it) and N viewers sharing a skein at the same
// moment: each share is one 12-megapixel JPEG through the real route (sniffing, pixel limit,
// orientation, sRGB, renditions, yarn-area palette, object store, rows). Each share is timed
// from its request to the 201, which comes after the renditions are stored and the rows saved.
// Prints median and p95 and the server's peak memory (VmHWM from /proc) beside the targets, and
// the server's CPU time per share with the machine's load: on a shared machine the times follow
// the load, while CPU time per share is the figure that shows what a change saved.
import { readFileSync } from 'node:fs';
import { request } from 'node:http';
import { loadavg } from 'node:os';
import { parseArgs } from 'node:util';
import type { RunningServer } from '../../apps/server/src/server.ts';
import { encodeForm, signUpVerified } from '../../apps/server/src/test-support/client.ts';
import {
  YARN_ON_LEFT,
  baseDetails,
  largeSkeinJpeg,
  makeSharingMonth,
  shareForm,
  sharePath,
} from '../../apps/server/src/test-support/sharing-fixtures.ts';
import { startServerProcess } from './server-process.ts';

const { values: args } = parseArgs({
  options: { shares: { type: 'string', default: '20' }, warmup: { type: 'string', default: '5' } },
});
const shareCount = Math.min(200, Math.max(1, Number(args.shares)));
const warmupCount = Math.min(50, Math.max(0, Number(args.warmup)));
const targets = { medianS: 1.5, peakMemoryMb: 700 };

const say = (text: string) => console.log(`[bench:upload] ${text}`);

/** Peak resident memory of a process (VmHWM), MB. */
function peakMemoryMb(pid: number): number {
  const status = readFileSync(`/proc/${pid}/status`, 'utf8');
  return Number(status.match(/VmHWM:\s+(\d+)/)?.[1] ?? 0) / 1024;
}

/** User + system CPU time of a process and all its threads, s (fields 14 and 15 of proc(5) stat). */
function cpuSeconds(pid: number): number {
  const fields = readFileSync(`/proc/${pid}/stat`, 'utf8').split(') ')[1]!.split(' ');
  return (Number(fields[11]) + Number(fields[12])) / 100;
}

/** The fixtures need only the URL and the origin of a RunningServer. */
const asServer = (url: string) =>
  ({ url, deps: { config: { PUBLIC_ORIGIN: url } } }) as unknown as RunningServer;

/**
 * One POST through node:http with a prepared body. The load generator shares the machine's two
 * cores with the server: fetch spent 15–28 ms of CPU per 2.2 MB share, node:http about 6 ms.
 */
function post(url: string, headers: Record<string, string>, bytes: Uint8Array) {
  return new Promise<{ status: number; text: string }>((resolve, reject) => {
    const req = request(
      url,
      { method: 'POST', headers: { ...headers, 'content-length': String(bytes.length) } },
      (res) => {
        let text = '';
        res.setEncoding('utf8');
        res.on('data', (chunk: string) => (text += chunk));
        res.on('end', () => resolve({ status: res.statusCode ?? 0, text }));
      },
    );
    req.on('error', reject);
    req.end(bytes);
  });
}

const percentile = (sorted: number[], p: number) =>
  sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)] ?? NaN;

async function main() {
  const photo = await largeSkeinJpeg();
  say(
    `${shareCount} concurrent shares of a 4000 × 3000 JPEG (${(photo.length / 1e6).toFixed(1)} MB)`,
  );
  const { child, url } = await startServerProcess({
    NODE_ENV: 'test',
    AUTH_ATTEMPTS_PER_MINUTE: '1000',
    // One host shares every skein here; the limits are not what is measured.
    SHARES_PER_HOUR: '1000',
    SHARE_STORAGE_QUOTA_BYTES: String(2 ** 40),
    APPS_DIR: '',
  });
  try {
    const { client: host } = await signUpVerified(asServer(url), 'bench-upload', 'Bench Host');
    const slug = `bench-up-${Date.now().toString(36)}`;
    const studio = await host.request('POST', '/api/studios', {
      name: 'Benchmark Cove Studio',
      slug,
      accentHex: '#1f6f78',
    });
    if (studio.status !== 201) throw new Error(`studio: ${studio.status}`);
    const month = await makeSharingMonth(host, slug);
    // The body is encoded once: the load generator shares the machine's cores with the server,
    // and encoding 20 multipart bodies at once would take CPU the server is measured on.
    const body = await encodeForm(shareForm([photo], { ...baseDetails, crops: [YARN_ON_LEFT] }));
    const share = () =>
      post(`${url}${sharePath({ slug }, month.dyeAlong.id)}`, host.headersFor(body), body.bytes);
    // A few shares one after another first: a server at a live event has been running, so the
    // burst is measured after the JIT has compiled the route, not during its first seconds.
    for (let i = 0; i < warmupCount; i++) {
      const res = await share();
      if (res.status !== 201) throw new Error(`warm-up share: ${res.status} ${res.text}`);
    }
    say(`${warmupCount} warm-up shares done, one after another; now ${shareCount} at once`);
    const baselineMb = peakMemoryMb(child.pid!);
    const cpuBefore = cpuSeconds(child.pid!);
    const generatorBefore = process.cpuUsage();
    const loadBefore = loadavg()[0]!;

    const results = await Promise.all(
      Array.from({ length: shareCount }, async () => {
        const started = performance.now();
        const res = await share();
        const ms = performance.now() - started;
        return { ms, ok: res.status === 201, detail: res.status === 201 ? '' : res.text };
      }),
    );
    const errors = results.filter((r) => !r.ok);
    const times = results.map((r) => r.ms).sort((a, b) => a - b);
    const median = percentile(times, 50) / 1000;
    const p95 = percentile(times, 95) / 1000;
    const peak = peakMemoryMb(child.pid!);
    const cpuPerShareMs = ((cpuSeconds(child.pid!) - cpuBefore) / shareCount) * 1000;
    const generator = process.cpuUsage(generatorBefore);
    const generatorPerShareMs = (generator.user + generator.system) / 1000 / shareCount;
    say(`median ${median.toFixed(2)} s   (target < ${targets.medianS} s)`);
    say(`p95    ${p95.toFixed(2)} s`);
    say(
      `server peak memory ${peak.toFixed(0)} MB   (target < ${targets.peakMemoryMb} MB; ${baselineMb.toFixed(0)} MB before the shares)`,
    );
    say(
      `server CPU ${cpuPerShareMs.toFixed(0)} ms per share (load generator ${generatorPerShareMs.toFixed(0)} ms); machine load ${loadBefore.toFixed(1)} before, ${loadavg()[0]!.toFixed(1)} after (1-min average)`,
    );
    say(`errors ${errors.length}${errors[0] ? `: ${errors[0].detail.slice(0, 200)}` : ''}`);
    const met = median < targets.medianS && peak < targets.peakMemoryMb && errors.length === 0;
    say(met ? 'all targets met' : 'a target was missed');
    process.exitCode = met ? 0 : 1;
  } finally {
    child.kill('SIGTERM');
  }
}

await main();
