import { useQuery } from '@tanstack/react-query';
import type { MeasureSystem } from '@vatside/dye-kit';
import { RequireSignIn } from '@vatside/ui/account/RequireSignIn';
import { ErrorPanel } from '@vatside/ui/ErrorPanel';
import { LoadingBlock } from '@vatside/ui/LoadingBlock';
import { useMe } from '@vatside/ui/session.ts';
import { useState } from 'react';
import { useParams, useSearchParams } from 'react-router-dom';
import { PrintToolbar, paperFor, type Paper } from '../../components/PrintToolbar.tsx';
import { dyeAgainQueryOptions } from '../../features/archive/api.ts';
import { BatchSheet } from '../../features/archive/components/BatchSheet.tsx';
import { studioQueryOptions } from '../../features/studios/api.ts';

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
  const [paper, setPaper] = useState<Paper>(paperFor(initialSystem));
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
      <PrintToolbar
        backTo={`/studios/${slug}/archive/${archivedColorwayId}`}
        backLabel="Back to the archived colorway"
        paper={paper}
        onPaper={setPaper}
        system={system}
        onSystem={setSystem}
        printLabel="Print this sheet"
      />
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
