import { useQuery } from '@tanstack/react-query';
import { RequireSignIn } from '@vatside/ui/account/RequireSignIn';
import { ErrorPanel } from '@vatside/ui/ErrorPanel';
import { LoadingBlock } from '@vatside/ui/LoadingBlock';
import { useMe } from '@vatside/ui/session.ts';
import { useParams } from 'react-router-dom';
import { RecipeCardScreen } from '../../features/dye-alongs/components/RecipeCardScreen.tsx';
import { stepsQueryOptions } from '../../features/run-sheet/api.ts';
import { studioQueryOptions } from '../../features/studios/api.ts';

/**
 * A colorway's printable recipe card. It sits outside the console's shell, so the page prints
 * as the card alone; its own toolbar hides when printing.
 */
export function Component() {
  return (
    <RequireSignIn>
      <main id="main">
        <RecipeCardRoute />
      </main>
    </RequireSignIn>
  );
}

function RecipeCardRoute() {
  const { slug = '', dyeAlongId = '', colorwayId = '' } = useParams();
  const { data: me } = useMe();
  const studio = useQuery(studioQueryOptions(slug));
  const steps = useQuery(stepsQueryOptions(slug, colorwayId));
  const failure = studio.error ?? steps.error;
  if (failure) {
    return (
      <ErrorPanel
        title="The recipe card could not be opened"
        error={failure}
        onRetry={() => {
          void studio.refetch();
          void steps.refetch();
        }}
      />
    );
  }
  if (!studio.data || !steps.data) return <LoadingBlock label="Opening the recipe card…" />;
  if (studio.data.myRole !== 'host' && studio.data.myRole !== 'moderator') {
    return (
      <ErrorPanel
        title="Recipe cards are for the studio’s team"
        error={{ message: 'Ask a host of this studio if you need this card.' }}
      />
    );
  }
  return (
    <RecipeCardScreen
      slug={slug}
      dyeAlongId={dyeAlongId}
      colorwayId={colorwayId}
      studioName={studio.data.name}
      initialSystem={me?.profile.unitSystem ?? 'us'}
      steps={steps.data.steps}
      backTo={`/studios/${slug}/dye-alongs/${dyeAlongId}`}
    />
  );
}
