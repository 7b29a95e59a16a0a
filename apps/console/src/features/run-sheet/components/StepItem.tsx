import type { Step } from '@vatside/contracts/workbench-colorways';
import { celsiusToFahrenheit } from '@vatside/dye-kit';
import { Button } from '@vatside/ui/Button';
import { StepCaution } from '@vatside/ui/StepCaution';
import { MoveButtons, SortableItem } from '../../../components/SortableList.tsx';
import { TwoPressButton } from '../../../components/TwoPressButton.tsx';
import { formatAmount, formatTimer } from '../../../lib/format.ts';
import type { LineChoice } from './RunSheet.tsx';

export function StepItem({
  step,
  number,
  isLast,
  line,
  canEdit,
  onMove,
  onEdit,
  onDelete,
}: {
  step: Step;
  number: number;
  isLast: boolean;
  line: LineChoice | undefined;
  canEdit: boolean;
  onMove: (by: -1 | 1) => void;
  onEdit: () => void;
  onDelete: () => void;
}) {
  return (
    <SortableItem id={step.id} itemWord="step" number={number} canEdit={canEdit}>
      <div className="min-w-0 flex-1 space-y-2">
        <p className="text-lg">
          <span className="mr-2 inline-flex size-8 items-center justify-center rounded-full bg-vat-800 font-bold text-wool-50">
            {number}
          </span>
          {step.instruction}
        </p>
        <ul className="flex flex-wrap gap-x-5 gap-y-1">
          {line ? (
            <li>
              <span className="font-bold">Measure:</span> {line.name}, {line.amount}
            </li>
          ) : null}
          {step.timerSeconds !== null ? (
            <li>
              <span className="font-bold">Timer:</span> {formatTimer(step.timerSeconds)} (min:sec)
            </li>
          ) : null}
          {step.temperatureC !== null ? (
            <li>
              <span className="font-bold">Heat:</span> {formatAmount(step.temperatureC)} °C /{' '}
              {formatAmount(celsiusToFahrenheit(step.temperatureC))} °F
              {step.visualCue ? <> · {step.visualCue}</> : null}
            </li>
          ) : null}
        </ul>
        <StepCaution kind={step.caution} />
        {canEdit ? (
          <div className="flex flex-wrap gap-2">
            <MoveButtons itemWord="step" number={number} isLast={isLast} onMove={onMove} />
            <Button variant="secondary" aria-label={`Change step ${number}`} onClick={onEdit}>
              Change
            </Button>
            <TwoPressButton
              label={`Delete step ${number}`}
              confirm="Yes, delete"
              onConfirm={onDelete}
            />
          </div>
        ) : null}
      </div>
    </SortableItem>
  );
}
