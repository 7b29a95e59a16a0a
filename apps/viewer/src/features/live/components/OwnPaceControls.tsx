import type { PotTimer } from '@vatside/contracts/pot-timer';
import { Button } from '@vatside/ui/Button';
import type { OwnPaceAction } from '../utils/own-pace.ts';

/** The viewer's own run-sheet controls for one pot: big, and in reach of one thumb. */
export function OwnPaceControls({
  timer,
  stepIndex,
  stepCount,
  onPress,
}: {
  timer: PotTimer;
  stepIndex: number;
  stepCount: number;
  onPress: (action: OwnPaceAction) => void;
}) {
  const hasTimer = timer.durationMs > 0;
  return (
    <div className="space-y-3">
      {hasTimer ? (
        <div className="grid grid-cols-[2fr_1fr] gap-3">
          {timer.state === 'idle' ? (
            <Button size="hand" onClick={() => onPress('start')}>
              Start timer
            </Button>
          ) : timer.state === 'running' ? (
            <Button size="hand" variant="secondary" onClick={() => onPress('pause')}>
              Pause timer
            </Button>
          ) : (
            <Button size="hand" onClick={() => onPress('resume')}>
              Resume timer
            </Button>
          )}
          <Button size="hand" variant="secondary" onClick={() => onPress('addMinute')}>
            +1 min
          </Button>
        </div>
      ) : null}
      <Button size="hand" disabled={stepIndex >= stepCount - 1} onClick={() => onPress('next')}>
        Next step <span aria-hidden="true">→</span>
      </Button>
      <Button
        variant="secondary"
        className="w-full"
        disabled={stepIndex <= 0}
        onClick={() => onPress('previous')}
      >
        <span aria-hidden="true">←</span> Previous step
      </Button>
    </div>
  );
}
