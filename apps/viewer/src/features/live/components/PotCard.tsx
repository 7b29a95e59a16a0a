import type { LivePot } from '@vatside/contracts/live';
import type { LiveProgramPot, LiveStep } from '@vatside/contracts/live-program';
import type { PotTimer } from '@vatside/contracts/pot-timer';
import type { ScaledRecipe } from '@vatside/dye-kit';
import { Button } from '@vatside/ui/Button';
import { Card } from '@vatside/ui/Card';
import { Swatch } from '@vatside/ui/Swatch';
import { useId } from 'react';
import { amountForLine, stepLineIndex } from '../utils/amounts.ts';
import type { Kit } from '../../../lib/kit.ts';
import type { OwnPaceAction, OwnPot } from '../utils/own-pace.ts';
import { OwnPaceControls } from './OwnPaceControls.tsx';
import { PotCountdown } from './PotCountdown.tsx';
import { StepAmountView } from './StepAmountView.tsx';
import { StepFacts } from './StepFacts.tsx';

export type PotCardProps = {
  pot: LiveProgramPot;
  /** The host's pot as the viewer should see it; undefined until the first state arrives. */
  host: LivePot | undefined;
  own: OwnPot | undefined;
  scaled: ScaledRecipe | null;
  kit: Kit;
  serverNowMs: number;
  localNowMs: number;
  onOwnPace: () => void;
  onPress: (action: OwnPaceAction) => void;
  onBackToHost: () => void;
};

/** One pot on the stove: where it is in its run sheet, what to measure, and its countdown. */
export function PotCard(props: PotCardProps) {
  const { pot, host, own } = props;
  const headingId = useId();
  const place = own ?? host;
  const step = place ? pot.steps[place.stepIndex] : undefined;
  const next = place ? pot.steps[place.stepIndex + 1] : undefined;
  const timer: PotTimer | undefined = own?.timer ?? host?.timer;

  return (
    <Card as="section" aria-labelledby={headingId} className="space-y-4">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h2 id={headingId} className="font-display text-3xl leading-tight font-semibold">
          {pot.colorwayName}
        </h2>
        <span className="rounded-full border-2 border-vat-800 px-3 py-0.5 text-base font-bold">
          {own ? 'Your own pace' : 'With the host'}
        </span>
      </div>
      {pot.swatches.length > 0 ? (
        <ul aria-label={`Colors of ${pot.colorwayName}`} className="flex flex-wrap gap-x-5 gap-y-2">
          {pot.swatches.map((s) => (
            <li key={`${s.hex}-${s.name}`}>
              <Swatch hex={s.hex} label={s.name} />
            </li>
          ))}
        </ul>
      ) : null}

      {/* Polite: a screen reader hears the new step, not every tick of the countdown. */}
      <div aria-live="polite" aria-atomic="true" className="space-y-1">
        {place && step ? (
          <>
            <p className="text-lg font-bold text-vat-800">
              Step {place.stepIndex + 1} of {pot.steps.length}
            </p>
            <p className="text-3xl leading-snug font-bold">{step.instruction}</p>
          </>
        ) : (
          <p className="text-2xl font-bold">Waiting for the host to start this pot…</p>
        )}
      </div>

      {timer && step ? (
        <PotCountdown
          colorwayName={pot.colorwayName}
          timer={timer}
          nowMs={own ? props.localNowMs : props.serverNowMs}
        />
      ) : null}

      {step ? <StepAmounts step={step} {...props} /> : null}
      {step ? <StepFacts step={step} /> : null}

      {place ? (
        <p className="border-t-2 border-wool-200 pt-3 text-xl">
          {next ? (
            <>
              <span className="font-bold">Next: </span>
              {next.instruction}
            </>
          ) : (
            <span className="font-bold">This is the last step.</span>
          )}
        </p>
      ) : null}

      {own ? (
        <OwnPaceControls
          timer={own.timer}
          stepIndex={own.stepIndex}
          stepCount={pot.steps.length}
          onPress={props.onPress}
        />
      ) : null}

      {own ? (
        <div className="space-y-2">
          {host ? (
            <p className="text-lg">
              The host is on step {host.stepIndex + 1} of {pot.steps.length}.
            </p>
          ) : null}
          <Button size="hand" variant="secondary" onClick={props.onBackToHost}>
            Back to the host
          </Button>
        </div>
      ) : (
        <Button size="hand" variant="secondary" onClick={props.onOwnPace}>
          Go at my own pace
        </Button>
      )}
    </Card>
  );
}

/** The step's line for the viewer's skein, or the lines of their own kit when they differ. */
function StepAmounts({ pot, step, scaled, kit }: PotCardProps & { step: LiveStep }) {
  const lineIndex = stepLineIndex(pot, step);
  if (lineIndex === null) return null;
  if (!scaled) {
    return (
      <p className="text-lg">
        This recipe could not be scaled to your skein; use the host’s amounts.
      </p>
    );
  }
  const source = pot.recipe.lines[lineIndex];
  const amount = amountForLine(scaled, lineIndex);
  if (!amount) return null;
  if (!kit.dyeKind || source?.kind === kit.dyeKind) {
    return <StepAmountView amount={amount} source={source} kit={kit} />;
  }
  // The contract does not pair a stock line with its food-color stand-in: show the viewer's kind.
  const yours = pot.recipe.lines.flatMap((line, i) => {
    const theirs = line.kind === kit.dyeKind ? amountForLine(scaled, i) : null;
    return theirs ? [{ line, amount: theirs }] : [];
  });
  return (
    <div className="space-y-2">
      <p className="text-lg">
        The host measures <span className="font-bold">{amount.line.name}</span> here. With{' '}
        {kit.dyeKind === 'foodColor' ? 'food color' : 'stock solutions'}, this pot takes:
      </p>
      {yours.map(({ line, amount: theirs }) => (
        <StepAmountView key={line.id} amount={theirs} source={line} kit={kit} />
      ))}
    </div>
  );
}
