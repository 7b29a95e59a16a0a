import { spawn, type ChildProcess } from 'node:child_process';
import { createServer } from 'node:net';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

// One server process for a benchmark, started the way `npm start` runs it (serve.sh, which execs
// node, so the child's pid is the server's), on a free port.

const serverDir = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../../apps/server');

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const probe = createServer();
    probe.once('error', reject);
    probe.listen(0, '127.0.0.1', () => {
      const address = probe.address();
      probe.close(() => resolve(typeof address === 'object' && address ? address.port : 0));
    });
  });
}

/**
 * Starts the server with the caller's environment plus `env`, and `nodeFlags` for Node itself
 * (e.g. a CPU profile); resolves once /api/health answers.
 */
export async function startServerProcess(
  env: Record<string, string>,
  nodeFlags: string[] = [],
): Promise<{ child: ChildProcess; url: string }> {
  const port = await freePort();
  const url = `http://127.0.0.1:${port}`;
  const child = spawn('bash', ['serve.sh', ...nodeFlags], {
    cwd: serverDir,
    env: {
      ...process.env,
      HOST: '127.0.0.1',
      PORT: String(port),
      PUBLIC_ORIGIN: url,
      LOG_LEVEL: 'warn',
      MAIL_WORKER_ENABLED: 'false',
      REDIS_URL: '',
      ...env,
    },
    stdio: ['ignore', 'inherit', 'inherit'],
  });
  const deadline = Date.now() + 60_000;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`the server exited (${child.exitCode})`);
    const up = await fetch(`${url}/api/health`).then(
      (r) => r.ok,
      () => false,
    );
    if (up) return { child, url };
    await new Promise((r) => setTimeout(r, 250));
  }
  child.kill('SIGTERM');
  throw new Error('the server did not answer /api/health within 60 s');
}
