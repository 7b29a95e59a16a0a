import { Button } from '@vatside/ui/Button';
import type { SoundChoice } from '../hooks/use-chime.ts';

/** Once the viewer has answered the prompt, the chime is switched here. */
export function SoundSwitch({
  choice,
  onTurnOn,
  onTurnOff,
}: {
  choice: SoundChoice;
  onTurnOn: () => void;
  onTurnOff: () => void;
}) {
  return (
    <div className="flex flex-wrap items-center gap-3">
      <p className="text-lg">
        Chime when a timer ends: <span className="font-bold">{choice === 'on' ? 'on' : 'off'}</span>
      </p>
      {choice === 'on' ? (
        <Button variant="secondary" onClick={onTurnOff}>
          Turn off sound
        </Button>
      ) : (
        <Button variant="secondary" onClick={onTurnOn}>
          Turn on sound
        </Button>
      )}
    </div>
  );
}
