import { useQuery } from '@tanstack/react-query';
import type { MeasureSystem } from '@vatside/dye-kit';
import { RequireSignIn } from '@vatside/ui/account/RequireSignIn';
import { Button } from '@vatside/ui/Button';
import { ErrorPanel } from '@vatside/ui/ErrorPanel';
import { SelectField } from '@vatside/ui/form/SelectField';
import { textLinkClass } from '@vatside/ui/link-class.ts';
import { LoadingBlock } from '@vatside/ui/LoadingBlock';
import { useMe } from '@vatside/ui/session.ts';
import { useState } from 'react';
import { Link, useParams, useSearchParams } from 'react-router-dom';
import { SystemSwitch } from '../../components/SystemSwitch.tsx';
import { dyeAgainQueryOptions } from '../../features/archive/api.ts';
import { BatchSheet, type Paper } from '../../features/archive/components/BatchSheet.tsx';
import { studioQueryOptions } from '../../features/studios/api.ts';

const paperNames: Record<Paper, string> = { a4: 'A4', letter: 'US Letter' };

/**
 * The printable batch sheet for dyeing an archived colorway again. Like the recipe card it sits
 * outside the console's shell, so the page prints as the sheet alone.
 */
export function Component() {
  return (
    <RequireSignIn>
      <main id="main">
        <BatchSheetRoute />
      </main>
    </RequireSignIn>
  );
}

function BatchSheetRoute() {
  const { data: me } = useMe();
  const initial: MeasureSystem = me?.profile.unitSystem ?? 'us';
  return <BatchSheetScreen key={initial} initialSystem={initial} />;
}

function BatchSheetScreen({ initialSystem }: { initialSystem: MeasureSystem }) {
  const { slug = '', archivedColorwayId = '' } = useParams();
  const [params] = useSearchParams();
  const [system, setSystem] = useState(initialSystem);
  const [paper, setPaper] = useState<Paper>(initialSystem === 'us' ? 'letter' : 'a4');
  const studio = useQuery(studioQueryOptions(slug));
  const potId = params.get('potId');
  const sheet = useQuery(
    dyeAgainQueryOptions(slug, archivedColorwayId, {
      baseId: params.get('baseId') ?? '',
      skeins: Number(params.get('skeins') ?? 1),
      ...(potId ? { potId } : {}),
      system,
    }),
  );
  const failure = studio.error ?? sheet.error;
  return (
    <div className="space-y-6 px-4 py-6">
      <div className="vs-print-hide mx-auto flex max-w-4xl flex-wrap items-end gap-4 rounded-card bg-vat-900 p-4 text-wool-50 [--vs-focus:var(--color-marigold-300)]">
        <Link
          to={`/studios/${slug}/archive/${archivedColorwayId}`}
          className={`${textLinkClass} gap-1 text-wool-50 hover:text-marigold-300`}
        >
          <span aria-hidden="true">←</span>Back to the archived colorway
        </Link>
        <SelectField
          label="Paper"
          className="w-44"
          value={paper}
          onChange={(event) => setPaper(event.target.value as Paper)}
        >
          {Object.entries(paperNames).map(([value, label]) => (
            <option key={value} value={value}>
              {label}
            </option>
          ))}
        </SelectField>
        <div className="rounded-xl bg-wool-50 text-vat-950">
          <SystemSwitch system={system} onChange={setSystem} />
        </div>
        <Button variant="secondary" className="ml-auto" onClick={() => window.print()}>
          Print this sheet
        </Button>
      </div>
      {failure ? (
        <ErrorPanel
          title="The batch sheet could not be worked out"
          error={failure}
          onRetry={() => {
            void studio.refetch();
            void sheet.refetch();
          }}
        />
      ) : !studio.data || !sheet.data ? (
        <LoadingBlock label="Working out the batches…" />
      ) : (
        <BatchSheet sheet={sheet.data} studioName={studio.data.name} paper={paper} />
      )}
    </div>
  );
}
