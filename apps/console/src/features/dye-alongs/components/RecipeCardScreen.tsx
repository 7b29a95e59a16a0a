import { useQuery } from '@tanstack/react-query';
import type { Step } from '@vatside/contracts/workbench-colorways';
import type { MeasureSystem } from '@vatside/dye-kit';
import { ErrorPanel } from '@vatside/ui/ErrorPanel';
import { LoadingBlock } from '@vatside/ui/LoadingBlock';
import { useState } from 'react';
import { PrintToolbar, paperFor, type Paper } from '../../../components/PrintToolbar.tsx';
import { dyeAlongQueryOptions } from '../api.ts';
import { useRecipeCard } from '../hooks/use-recipe-card.ts';
import { RecipeCard } from './RecipeCard.tsx';

/** The printable card with its screen-only toolbar: back, paper size, measures, print. */
export function RecipeCardScreen({
  slug,
  dyeAlongId,
  colorwayId,
  studioName,
  initialSystem,
  steps,
  backTo,
}: {
  slug: string;
  dyeAlongId: string;
  colorwayId: string;
  studioName: string;
  initialSystem: MeasureSystem;
  steps: Step[];
  backTo: string;
}) {
  const [system, setSystem] = useState(initialSystem);
  const [paper, setPaper] = useState<Paper>(paperFor(initialSystem));
  const dyeAlong = useQuery(dyeAlongQueryOptions(slug, dyeAlongId));
  const card = useRecipeCard(slug, dyeAlongId, colorwayId, system);
  const failure = dyeAlong.error ?? card.error;

  return (
    <div className="space-y-6 px-4 py-6">
      <PrintToolbar
        backTo={backTo}
        backLabel="Back to the dye-along"
        paper={paper}
        onPaper={setPaper}
        system={system}
        onSystem={setSystem}
        printLabel="Print this card"
      />
      {failure ? (
        <ErrorPanel
          title="The recipe card could not be put together"
          error={failure}
          onRetry={card.retry}
        />
      ) : !dyeAlong.data || !card.data ? (
        <LoadingBlock label="Working out the amounts…" />
      ) : !card.data.hostBath ? (
        <ErrorPanel
          title="That colorway is not in this dye-along"
          error={{ message: 'Pick one of the month’s colorways from the dye-along.' }}
        />
      ) : (
        <RecipeCard
          studioName={studioName}
          dyeAlongTitle={dyeAlong.data.title}
          startsLabel={dyeAlong.data.startsAtHost.label}
          paper={paper}
          system={system}
          supplies={card.data.hostBatch}
          hostBath={card.data.hostBath}
          scaled={card.data.scaled}
          steps={steps}
        />
      )}
    </div>
  );
}
