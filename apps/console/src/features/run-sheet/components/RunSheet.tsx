import { arrayMove } from '@dnd-kit/sortable';
import type { Step } from '@vatside/contracts/workbench-colorways';
import { FormAlert } from '@vatside/ui/form/FormAlert';
import { SortableList } from '../../../components/SortableList.tsx';
import { useDeleteStep, useReorderSteps } from '../api.ts';
import { StepItem } from './StepItem.tsx';

/** A recipe line the host can point a step at, with its computed amount in words. */
export type LineChoice = { id: string; name: string; amount: string };

/**
 * The ordered steps: drag by the handle, or use the move buttons (keyboard and wet thumbs).
 * "Change" opens a step in the form below the list.
 */
export function RunSheet({
  slug,
  colorwayId,
  steps,
  lines,
  canEdit,
  onEdit,
}: {
  slug: string;
  colorwayId: string;
  steps: Step[];
  lines: LineChoice[];
  canEdit: boolean;
  onEdit: (step: Step, number: number) => void;
}) {
  const reorder = useReorderSteps(slug, colorwayId);
  const remove = useDeleteStep(slug, colorwayId);
  const ids = steps.map((s) => s.id);

  const move = (from: number, to: number) => {
    if (to < 0 || to >= ids.length || from === to) return;
    reorder.mutate(arrayMove(ids, from, to));
  };

  if (steps.length === 0) {
    return (
      <p className="text-lg">
        No steps yet. Write the first one below: soak, heat, add dye, add acid, hold, cool.
      </p>
    );
  }
  return (
    <div className="space-y-3">
      {reorder.error ? (
        <FormAlert>The new order was not saved: {reorder.error.message}</FormAlert>
      ) : null}
      {remove.error ? <FormAlert>{remove.error.message}</FormAlert> : null}
      <SortableList ids={ids} label="Run sheet" itemWord="step" onMove={move}>
        {steps.map((step, index) => (
          <StepItem
            key={step.id}
            step={step}
            number={index + 1}
            isLast={index === steps.length - 1}
            line={lines.find((l) => l.id === step.recipeLineId)}
            canEdit={canEdit}
            onMove={(by) => move(index, index + by)}
            onEdit={() => onEdit(step, index + 1)}
            onDelete={() => remove.mutate(step.id)}
          />
        ))}
      </SortableList>
    </div>
  );
}
