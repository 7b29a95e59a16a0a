import { useQuery } from '@tanstack/react-query';
import { RequireSignIn } from '@vatside/ui/account/RequireSignIn';
import { ErrorPanel } from '@vatside/ui/ErrorPanel';
import { LoadingBlock } from '@vatside/ui/LoadingBlock';
import { useParams } from 'react-router-dom';
import { recapQueryOptions } from '../../features/recap/api.ts';
import { Presenter } from '../../features/recap/components/Presenter.tsx';

/** The recap full screen, without the console around it: for recording. */
export function Component() {
  const { slug = '', dyeAlongId = '' } = useParams();
  return (
    <RequireSignIn>
      <PresenterLoader slug={slug} dyeAlongId={dyeAlongId} />
    </RequireSignIn>
  );
}

function PresenterLoader({ slug, dyeAlongId }: { slug: string; dyeAlongId: string }) {
  // Loaded once: a refetch while recording would reset nothing, but it is not wanted either.
  const recap = useQuery({
    ...recapQueryOptions(slug, dyeAlongId),
    staleTime: Infinity,
    refetchOnWindowFocus: false,
    refetchOnReconnect: false,
  });
  if (recap.isPending) return <LoadingBlock label="Setting out the recap…" />;
  if (recap.isError) {
    return (
      <main className="mx-auto max-w-2xl p-6">
        <ErrorPanel
          title="The recap could not be opened"
          error={recap.error}
          onRetry={() => void recap.refetch()}
          retrying={recap.isFetching}
        />
      </main>
    );
  }
  return (
    <Presenter
      recap={recap.data}
      leaveTo={`/console/studios/${slug}/dye-alongs/${dyeAlongId}/recap`}
    />
  );
}
