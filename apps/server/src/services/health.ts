import { sql } from '@vatside/db/sql';
import type { Health, ServiceCheck } from '@vatside/contracts/health';
import type { AppDeps } from '../deps.ts';

const version = process.env.npm_package_version ?? '0.1.0';

async function timed(probe: () => Promise<unknown>): Promise<ServiceCheck> {
  const started = performance.now();
  try {
    await probe();
    return { ok: true, latencyMs: Math.round(performance.now() - started) };
  } catch (error) {
    const detail = error instanceof Error ? error.message || error.name : String(error);
    return { ok: false, latencyMs: Math.round(performance.now() - started), detail };
  }
}

export async function checkHealth({ database, objectStore, mailer }: AppDeps): Promise<Health> {
  const [db, store, mail] = await Promise.all([
    timed(() => database.db.execute(sql`select 1`)),
    timed(() => objectStore.ping()),
    timed(() => mailer.ping()),
  ]);
  const ok = db.ok && store.ok && mail.ok;
  return {
    status: ok ? 'ok' : 'degraded',
    version,
    checks: { database: db, objectStore: store, mail },
  };
}
