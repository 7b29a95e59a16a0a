import { useSortable } from '@dnd-kit/sortable';
import { CSS } from '@dnd-kit/utilities';
import type { Step } from '@vatside/contracts/workbench-colorways';
import { celsiusToFahrenheit } from '@vatside/dye-kit';
import { Button } from '@vatside/ui/Button';
import { StepCaution } from '@vatside/ui/StepCaution';
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
  onDelete,
}: {
  step: Step;
  number: number;
  isLast: boolean;
  line: LineChoice | undefined;
  canEdit: boolean;
  onMove: (by: -1 | 1) => void;
  onDelete: () => void;
}) {
  const {
    attributes,
    listeners,
    setNodeRef,
    setActivatorNodeRef,
    transform,
    transition,
    isDragging,
  } = useSortable({
    id: step.id,
    disabled: !canEdit,
  });
  return (
    <li
      ref={setNodeRef}
      style={{ transform: CSS.Transform.toString(transform), transition }}
      className={`flex gap-3 rounded-card border-2 bg-white p-3 ${isDragging ? 'relative z-10 border-vat-600 shadow-card' : 'border-wool-300'}`}
    >
      {canEdit ? (
        <button
          ref={setActivatorNodeRef}
          type="button"
          aria-label={`Drag step ${number}`}
          className="flex min-h-12 w-12 shrink-0 cursor-grab touch-none items-center justify-center rounded-lg border-2 border-wool-300 text-2xl text-vat-800 active:cursor-grabbing"
          {...attributes}
          {...listeners}
        >
          <span aria-hidden="true">⠿</span>
        </button>
      ) : null}
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
            <Button
              variant="secondary"
              disabled={number === 1}
              onClick={() => onMove(-1)}
              aria-label={`Move step ${number} up`}
            >
              ↑ Up
            </Button>
            <Button
              variant="secondary"
              disabled={isLast}
              onClick={() => onMove(1)}
              aria-label={`Move step ${number} down`}
            >
              ↓ Down
            </Button>
            <TwoPressButton
              label={`Delete step ${number}`}
              confirm="Yes, delete"
              onConfirm={onDelete}
            />
          </div>
        ) : null}
      </div>
    </li>
  );
}
