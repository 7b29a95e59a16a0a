import { useQuery } from '@tanstack/react-query';
import { RequireSignIn } from '@vatside/ui/account/RequireSignIn';
import { ErrorPanel } from '@vatside/ui/ErrorPanel';
import { LoadingBlock } from '@vatside/ui/LoadingBlock';
import { useParams } from 'react-router-dom';
import { recapQueryOptions } from '../../features/recap/api.ts';
import { Presenter } from '../../features/recap/components/Presenter.tsx';
import { PresenterNotes } from '../../features/recap/components/PresenterNotes.tsx';

/** The recap full screen, without the console around it: for recording. */
export function Component() {
  const { slug = '', dyeAlongId = '' } = useParams();
  return (
    <RequireSignIn>
      <RecapLoader slug={slug} dyeAlongId={dyeAlongId} notes={false} />
    </RequireSignIn>
  );
}

export function RecapLoader({
  slug,
  dyeAlongId,
  notes,
}: {
  slug: string;
  dyeAlongId: string;
  notes: boolean;
}) {
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
  const at = `/console/studios/${slug}/dye-alongs/${dyeAlongId}`;
  return notes ? (
    <PresenterNotes recap={recap.data} />
  ) : (
    <Presenter recap={recap.data} leaveTo={`${at}/recap`} notesPath={`${at}/presenter/notes`} />
  );
}
