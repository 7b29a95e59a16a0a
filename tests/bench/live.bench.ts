// pnpm bench:live [--viewers 2000] [--steps 20] [--batch 250] [--profile]
//
// One server process (a child, as `npm start` runs it) and N viewer phones on this machine: the
// host advances a step `steps` times and every viewer's receipt is timed against the host's send
// (one clock: the load generator and the host are this process). Then every viewer drops and
// comes back at once, and we time until all have their snapshot again. Prints the figures
// beside the targets for 5,000 viewers. Uses the test profile's database and mail catcher.
import type { ChildProcess } from 'node:child_process';
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { parseArgs } from 'node:util';
import { loadavg } from 'node:os';
import type { LiveState } from '@vatside/contracts/live';
import type { RealtimeError } from '@vatside/contracts/realtime';
import { signUpVerified, type TestClient } from '../../apps/server/src/test-support/client.ts';
import { makeLiveSessions } from '../../apps/server/src/test-support/live-fixtures.ts';
import type { RunningServer } from '../../apps/server/src/server.ts';
import { Phone } from './phone.ts';
import { startServerProcess } from './server-process.ts';

const { values: args } = parseArgs({
  options: {
    viewers: { type: 'string', default: '2000' },
    steps: { type: 'string', default: '20' },
    batch: { type: 'string', default: '250' },
    // Writes a V8 CPU profile of the server to .local/bench/ (open it in a browser's dev tools).
    profile: { type: 'boolean', default: false },
  },
});
const viewerCount = Math.min(20_000, Math.max(1, Number(args.viewers)));
const stepCount = Math.min(200, Math.max(1, Number(args.steps)));
const batchSize = Math.min(2_000, Math.max(1, Number(args.batch)));
const targets = { p99Ms: 250, peakMemoryMb: 1024, reconnectS: 10 };
const deliveryTimeoutMs = 15_000;
const reconnectTimeoutMs = 60_000;

const say = (text: string) => console.log(`[bench:live] ${text}`);

/** The server's own figures from /proc: peak resident memory (VmHWM) and current (VmRSS). */
function memoryMb(pid: number) {
  const status = readFileSync(`/proc/${pid}/status`, 'utf8');
  const kb = (field: string) => Number(status.match(new RegExp(`${field}:\\s+(\\d+)`))?.[1] ?? 0);
  return { peak: kb('VmHWM') / 1024, now: kb('VmRSS') / 1024 };
}

/** CPU seconds a process has used (user + system), from /proc/<pid>/stat. */
function cpuSeconds(pid: number) {
  const fields = readFileSync(`/proc/${pid}/stat`, 'utf8').split(') ')[1]?.split(' ') ?? [];
  return (Number(fields[11]) + Number(fields[12])) / 100; // clock ticks; 100 per second on Linux
}

/** The server as `npm start` runs it, with a CPU profile when asked (`--profile`). */
function startServer(): Promise<{ child: ChildProcess; url: string }> {
  const profileDir = path.resolve(fileURLToPath(import.meta.url), '../../../.local/bench');
  return startServerProcess(
    { NODE_ENV: 'test', AUTH_ATTEMPTS_PER_MINUTE: '1000', APPS_DIR: '' },
    args.profile ? ['--cpu-prof', `--cpu-prof-dir=${profileDir}`] : [],
  );
}

/** The server fixtures need only the URL and the origin of a RunningServer. */
const asServer = (url: string) =>
  ({ url, deps: { config: { PUBLIC_ORIGIN: url } } }) as unknown as RunningServer;

function cookieOf(client: TestClient): string {
  const jar = (client as unknown as { cookies: Map<string, string> }).cookies;
  return [...jar].map(([k, v]) => `${k}=${v}`).join('; ');
}

/** Connects (or reconnects) a phone and joins the session; resolves with its snapshot. */
async function connectAndJoin(phone: Phone, sessionId: string): Promise<LiveState> {
  await phone.connect(reconnectTimeoutMs);
  const reply = await phone.emitWithAck<{ state: LiveState } | RealtimeError>(
    'live:join',
    { sessionId },
    reconnectTimeoutMs,
  );
  if ('error' in reply) throw new Error(reply.error.message);
  return reply.state;
}

const percentile = (sorted: number[], p: number) =>
  sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)] ?? NaN;

async function main() {
  say(`${viewerCount} viewers, ${stepCount} steps, connecting ${batchSize} at a time`);
  const { child, url } = await startServer();
  const pid = child.pid!;
  let peakPolledMb = 0;
  const poll = setInterval(() => {
    peakPolledMb = Math.max(peakPolledMb, memoryMb(pid).now);
  }, 250);
  const viewers: Phone[] = [];
  let host: Phone | undefined;
  // Every viewer notes when each revision reaches it.
  const arrivals = new Map<number, number[]>();
  const onState = (revision: number, atMs: number) => {
    let list = arrivals.get(revision);
    if (!list) arrivals.set(revision, (list = []));
    list.push(atMs);
  };
  try {
    const server = asServer(url);
    const { client: hostClient } = await signUpVerified(server, 'bench-host', 'Bench Host');
    const slug = `bench-${Date.now().toString(36)}`;
    const studio = await hostClient.request('POST', '/api/studios', {
      name: 'Benchmark Bay Studio',
      slug,
      accentHex: '#1f6f78',
    });
    if (studio.status !== 201) throw new Error(`studio: ${studio.status}`);
    const live = await makeLiveSessions(hostClient, slug);
    const sessionId = live.liveSessionId;
    say(`session ${sessionId} on ${url} (server pid ${pid})`);

    const connectStarted = performance.now();
    for (let i = 0; i < viewerCount; i += batchSize) {
      const batch = Array.from(
        { length: Math.min(batchSize, viewerCount - i) },
        () => new Phone({ url, onState }),
      );
      viewers.push(...batch);
      await Promise.all(batch.map((s) => connectAndJoin(s, sessionId)));
    }
    say(
      `${viewerCount} viewers joined in ${((performance.now() - connectStarted) / 1000).toFixed(1)} s`,
    );

    host = new Phone({ url, cookie: cookieOf(hostClient) });
    let revision = (await connectAndJoin(host, sessionId)).revision;

    const latencies: number[] = [];
    let missing = 0;
    for (let step = 0; step < stepCount; step++) {
      const type = step % 2 === 0 ? 'step:next' : 'step:previous';
      const sentAt = performance.now();
      const reply = await host.emitWithAck<{ state: LiveState } | RealtimeError>(
        'live:action',
        { sessionId, action: { type, potId: live.potId } },
        10_000,
      );
      if ('error' in reply) throw new Error(`host action refused: ${reply.error.message}`);
      revision = reply.state.revision;
      const deadline = performance.now() + deliveryTimeoutMs;
      while ((arrivals.get(revision)?.length ?? 0) < viewerCount && performance.now() < deadline) {
        await new Promise((r) => setTimeout(r, 5));
      }
      const got = arrivals.get(revision) ?? [];
      missing += viewerCount - got.length;
      latencies.push(...got.map((at) => at - sentAt));
      await new Promise((r) => setTimeout(r, 150));
    }
    latencies.sort((a, b) => a - b);

    // Everyone drops at once (a network blip), then everyone comes back at once.
    await Promise.all(viewers.map((v) => v.close()));
    await new Promise((r) => setTimeout(r, 2_000));
    const reconnectStarted = performance.now();
    const back = await Promise.allSettled(viewers.map((v) => connectAndJoin(v, sessionId)));
    const reconnectS = (performance.now() - reconnectStarted) / 1000;
    const failed = back.filter((b) => b.status === 'rejected').length;
    const stale = back.filter(
      (b) => b.status === 'fulfilled' && b.value.revision !== revision,
    ).length;

    const memory = memoryMb(pid);
    const peakMb = Math.max(memory.peak, peakPolledMb);
    const p = (n: number) => percentile(latencies, n).toFixed(1);
    const check = (ok: boolean) => (ok ? 'meets target' : 'MISSES target');
    console.log('');
    console.log(
      `Live benchmark: ${viewerCount} viewers, ${stepCount} host steps, one server process`,
    );
    console.log(
      `  delivery latency  p50 ${p(50)} ms   p95 ${p(95)} ms   p99 ${p(99)} ms   max ${p(100)} ms` +
        `   (${latencies.length} deliveries, ${missing} missing)   ${check(percentile(latencies, 99) < targets.p99Ms && missing === 0)} (p99 < ${targets.p99Ms} ms)`,
    );
    console.log(
      `  server memory     peak ${peakMb.toFixed(0)} MB (VmHWM), now ${memory.now.toFixed(0)} MB   ${check(peakMb < targets.peakMemoryMb)} (< ${targets.peakMemoryMb} MB)`,
    );
    console.log(
      `  full reconnect    ${reconnectS.toFixed(2)} s for all ${viewerCount} to have their snapshot` +
        ` (${failed} failed, ${stale} stale)   ${check(reconnectS < targets.reconnectS && failed === 0 && stale === 0)} (< ${targets.reconnectS} s)`,
    );
    const generatorCpuS = (process.cpuUsage().user + process.cpuUsage().system) / 1e6;
    console.log(
      `  machine load      ${loadavg()
        .map((l) => l.toFixed(1))
        .join(' / ')} (1 / 5 / 15 min)`,
    );
    console.log(
      `  CPU used          server ${cpuSeconds(pid).toFixed(1)} s, load generator ${generatorCpuS.toFixed(1)} s (2 cores shared with everything else)`,
    );
    if (viewerCount < 5_000) console.log('  (the targets are for 5,000 viewers: --viewers 5000)');
  } finally {
    clearInterval(poll);
    await Promise.all([...viewers, ...(host ? [host] : [])].map((p) => p.close()));
    const exited = new Promise((r) => child.once('exit', r));
    child.kill('SIGTERM');
    await Promise.race([exited, new Promise((r) => setTimeout(r, 12_000))]);
  }
}

main().then(
  () => process.exit(0),
  (error: unknown) => {
    console.error('[bench:live] failed:', error);
    process.exit(1);
  },
);
