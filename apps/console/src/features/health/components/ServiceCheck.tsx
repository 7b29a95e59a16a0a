import { useQuery } from '@tanstack/react-query';
import type { Health, ServiceCheck as ServiceCheckResult } from '@vatside/contracts/health';
import { Button } from '@vatside/ui/Button';
import { Card } from '@vatside/ui/Card';
import { ErrorPanel } from '@vatside/ui/ErrorPanel';
import { LoadingBlock } from '@vatside/ui/LoadingBlock';
import { StatusPill } from '@vatside/ui/StatusPill';
import { healthQueryOptions } from '../api.ts';

const serviceNames: Record<keyof Health['checks'], string> = {
  database: 'Database',
  objectStore: 'Photo storage',
  mail: 'Mail',
};

export function ServiceCheck() {
  const { data, error, isPending, isFetching, refetch } = useQuery(healthQueryOptions());

  return (
    <Card as="section" aria-labelledby="service-check-title" className="space-y-4">
      <h2 id="service-check-title" className="font-display text-2xl font-semibold">
        Service check
      </h2>
      {isPending ? (
        <LoadingBlock label="Checking services…" />
      ) : error ? (
        <ErrorPanel
          title="The service check did not answer"
          error={error}
          onRetry={() => void refetch()}
          retrying={isFetching}
        />
      ) : (
        <>
          <p className="font-bold">
            {data.status === 'ok' ? 'Every service is answering.' : 'Some services need attention.'}
          </p>
          <ul className="divide-y divide-wool-200">
            {(Object.keys(serviceNames) as Array<keyof Health['checks']>).map((key) => (
              <ServiceRow key={key} name={serviceNames[key]} check={data.checks[key]} />
            ))}
          </ul>
          <div className="flex flex-wrap items-center justify-between gap-3">
            <p className="text-sm text-vat-800">Server version {data.version}</p>
            <Button variant="secondary" onClick={() => void refetch()} disabled={isFetching}>
              {isFetching ? 'Checking…' : 'Check again'}
            </Button>
          </div>
        </>
      )}
    </Card>
  );
}

function ServiceRow({ name, check }: { name: string; check: ServiceCheckResult }) {
  return (
    <li className="flex flex-wrap items-center justify-between gap-2 py-3">
      <div>
        <p className="font-bold">{name}</p>
        {check.detail ? <p className="text-sm text-vat-800">{check.detail}</p> : null}
      </div>
      <div className="flex items-center gap-3">
        <span className="text-sm tabular-nums text-vat-800">{Math.round(check.latencyMs)} ms</span>
        <StatusPill tone={check.ok ? 'ok' : 'fail'}>
          {check.ok ? 'Answering' : 'Not answering'}
        </StatusPill>
      </div>
    </li>
  );
}
