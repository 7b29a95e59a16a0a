import { useQuery } from '@tanstack/react-query';
import { buttonClass } from '@vatside/ui/Button';
import { ErrorPanel } from '@vatside/ui/ErrorPanel';
import { textLinkClass } from '@vatside/ui/link-class.ts';
import { LoadingBlock } from '@vatside/ui/LoadingBlock';
import { Link, useParams } from 'react-router-dom';
import { presenterPath, recapQueryOptions } from '../../features/recap/api.ts';
import { RunningOrder } from '../../features/recap/components/RunningOrder.tsx';
import { useWorkbench } from './workbench-role.ts';

/** studios/:slug/dye-alongs/:dyeAlongId/recap: the host builds the running order; helpers read it. */
export function Component() {
  const { slug, canEdit } = useWorkbench();
  const { dyeAlongId = '' } = useParams();
  const recap = useQuery(recapQueryOptions(slug, dyeAlongId));
  return (
    <div className="space-y-6">
      <div className="space-y-2">
        <Link to=".." relative="path" className={`${textLinkClass} gap-1`}>
          <span aria-hidden="true">←</span>The dye-along
        </Link>
        <div className="flex flex-wrap items-center justify-between gap-3">
          <h2 className="font-display text-3xl font-semibold">Recap</h2>
          <Link to={presenterPath(slug, dyeAlongId)} className={buttonClass()}>
            Present full screen
          </Link>
        </div>
      </div>
      {recap.isPending ? (
        <LoadingBlock label="Opening the running order…" />
      ) : recap.isError ? (
        <ErrorPanel
          title="The running order could not be opened"
          error={recap.error}
          onRetry={() => void recap.refetch()}
          retrying={recap.isFetching}
        />
      ) : (
        <RunningOrder slug={slug} dyeAlongId={dyeAlongId} recap={recap.data} canEdit={canEdit} />
      )}
    </div>
  );
}
