import { useQuery } from '@tanstack/react-query';
import type { Step } from '@vatside/contracts/workbench-colorways';
import type { MeasureSystem } from '@vatside/dye-kit';
import { Button } from '@vatside/ui/Button';
import { ErrorPanel } from '@vatside/ui/ErrorPanel';
import { SelectField } from '@vatside/ui/form/SelectField';
import { textLinkClass } from '@vatside/ui/link-class.ts';
import { LoadingBlock } from '@vatside/ui/LoadingBlock';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { SystemSwitch } from '../../../components/SystemSwitch.tsx';
import { dyeAlongQueryOptions } from '../api.ts';
import { useRecipeCard } from '../hooks/use-recipe-card.ts';
import { RecipeCard, type Paper } from './RecipeCard.tsx';

const paperNames: Record<Paper, string> = { a4: 'A4', letter: 'US Letter' };

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
  const [paper, setPaper] = useState<Paper>(initialSystem === 'us' ? 'letter' : 'a4');
  const dyeAlong = useQuery(dyeAlongQueryOptions(slug, dyeAlongId));
  const card = useRecipeCard(slug, dyeAlongId, colorwayId, system);
  const failure = dyeAlong.error ?? card.error;

  return (
    <div className="space-y-6 px-4 py-6">
      <div className="vs-print-hide mx-auto flex max-w-4xl flex-wrap items-end gap-4 rounded-card bg-vat-900 p-4 text-wool-50 [--vs-focus:var(--color-marigold-300)]">
        <Link to={backTo} className={`${textLinkClass} gap-1 text-wool-50 hover:text-marigold-300`}>
          <span aria-hidden="true">←</span>Back to the dye-along
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
          Print this card
        </Button>
      </div>
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
