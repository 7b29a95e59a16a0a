import type { HostAction, LivePot } from '@vatside/contracts/live';
import type { LiveProgramPot } from '@vatside/contracts/live-program';
import type { MeasureSystem } from '@vatside/dye-kit';
import { Button } from '@vatside/ui/Button';
import { cx } from '@vatside/ui/cx.ts';
import { useId, useMemo, type Ref } from 'react';
import { stepAmount } from '../utils/amounts.ts';
import { timerToggle } from '../utils/timer-control.ts';
import { PotCountdown } from './PotCountdown.tsx';
import { StepFacts } from './StepFacts.tsx';

export type PotCardProps = {
  /** 0-based; shown as the pot's number key. */
  index: number;
  pot: LivePot;
  program: LiveProgramPot | undefined;
  nowMs: number;
  system: MeasureSystem;
  chosen: boolean;
  refusal: string | undefined;
  onChoose: () => void;
  onAction: (action: HostAction) => void;
  ref?: Ref<HTMLElement>;
};

/** One pot on the stove: where it is in its run sheet, its timer, and big one-hand controls. */
export function PotCard({
  index,
  pot,
  program,
  nowMs,
  system,
  chosen,
  refusal,
  onChoose,
  onAction,
  ref,
}: PotCardProps) {
  const titleId = useId();
  const number = index + 1;
  const step = program?.steps[pot.stepIndex];
  const next = program?.steps[pot.stepIndex + 1];
  const toggle = timerToggle(pot.timer, nowMs);
  // The board re-renders with every tick of the countdown; the amount only with the step.
  const amount = useMemo(
    () => (program ? stepAmount(program, step, system) : null),
    [program, step, system],
  );
  const act = (type: 'timer:start' | 'timer:pause' | 'timer:resume') =>
    onAction({ type, potId: pot.potId });
  // The step on screen goes along: a second tap before the board updates is refused, not applied.
  const move = (type: 'step:next' | 'step:previous') =>
    onAction({ type, potId: pot.potId, fromStep: pot.stepIndex });
  const extend = (byMs: 60_000 | 300_000) =>
    onAction({ type: 'timer:extend', potId: pot.potId, byMs });

  return (
    <section
      ref={ref}
      aria-labelledby={titleId}
      tabIndex={-1}
      onFocus={onChoose}
      className={cx(
        'flex min-w-0 flex-col gap-2 rounded-card border-4 bg-wool-50 p-3 shadow-card',
        chosen ? 'border-vat-700' : 'border-wool-200',
      )}
    >
      <header className="flex items-center gap-3">
        <kbd
          aria-hidden="true"
          className={cx(
            'grid size-12 shrink-0 place-items-center rounded-xl font-sans text-2xl font-bold',
            chosen ? 'bg-vat-700 text-wool-50' : 'bg-wool-200 text-vat-950',
          )}
        >
          {number}
        </kbd>
        <div className="min-w-0">
          <h2 id={titleId} className="font-display text-2xl leading-tight font-semibold">
            Pot {number} · {pot.colorwayName}
          </h2>
          <p className="font-bold text-vat-800">
            Step {pot.stepIndex + 1} of {pot.stepCount}
            {chosen ? ' · chosen for the keys' : ''}
          </p>
        </div>
      </header>

      <p className="text-2xl leading-snug font-bold">{step?.instruction ?? 'No step here.'}</p>

      <PotCountdown timer={pot.timer} nowMs={nowMs} />

      {refusal ? (
        <p
          role="alert"
          className="rounded-xl border-2 border-madder-700 bg-madder-100 px-3 py-2 text-lg font-bold text-madder-800"
        >
          <span aria-hidden="true">✕ </span>
          {refusal}
        </p>
      ) : null}

      <div className="grid grid-cols-2 gap-2">
        <Button size="hand" variant="secondary" onClick={() => move('step:previous')}>
          ← Previous step
        </Button>
        <Button size="hand" onClick={() => move('step:next')}>
          Next step →
        </Button>
        {toggle ? (
          <Button
            size="hand"
            variant="secondary"
            className="col-span-2"
            onClick={() => act(toggle.type)}
          >
            {toggle.label}
          </Button>
        ) : (
          <p className="col-span-2 flex min-h-16 items-center justify-center rounded-xl border-2 border-dashed border-wool-300 px-3 text-center">
            No timer on this step: +1 min adds one.
          </p>
        )}
        <Button size="hand" variant="secondary" onClick={() => extend(60_000)}>
          +1 min
        </Button>
        <Button size="hand" variant="secondary" onClick={() => extend(300_000)}>
          +5 min
        </Button>
      </div>

      {/* The step's details sit under the controls, so the buttons stay in reach on a tablet. */}
      {step ? <StepFacts step={step} amount={amount} /> : null}
      <p className="text-lg text-vat-800">
        <span className="font-bold">Then: </span>
        {next ? next.instruction : 'This is the last step.'}
      </p>
    </section>
  );
}
