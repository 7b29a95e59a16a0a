import type { HostAction } from '@vatside/contracts/live';
import { maxStreamDelayMs } from '@vatside/contracts/live';
import { Button } from '@vatside/ui/Button';
import { useId, useState } from 'react';

const maxSeconds = maxStreamDelayMs / 1000;

/** Holds back what phones show so it lines up with the video, which reaches them late. */
export function StreamDelayForm({
  currentMs,
  refusal,
  onSend,
}: {
  currentMs: number;
  refusal: string | undefined;
  onSend: (action: HostAction) => Promise<boolean>;
}) {
  const fieldId = useId();
  const helpId = useId();
  const [draft, setDraft] = useState<string | null>(null);
  const shown = draft ?? String(currentMs / 1000);
  const seconds = Number(shown);
  const valid =
    shown.trim() !== '' && Number.isInteger(seconds) && seconds >= 0 && seconds <= maxSeconds;

  return (
    <form
      aria-label="Stream delay"
      className="space-y-3"
      onSubmit={async (event) => {
        event.preventDefault();
        if (valid && (await onSend({ type: 'delay:set', streamDelayMs: seconds * 1000 })))
          setDraft(null);
      }}
    >
      <p id={helpId}>
        Your video reaches phones some seconds late. Set that many seconds here and Vatside holds
        back what phones show, so each step and timer appears when viewers see it on the video. You
        see everything at once.
      </p>
      <div className="flex flex-wrap items-end gap-2">
        <div>
          <label htmlFor={fieldId} className="block font-bold">
            Delay in seconds (0–{maxSeconds})
          </label>
          <input
            id={fieldId}
            type="number"
            inputMode="numeric"
            min={0}
            max={maxSeconds}
            step={1}
            value={shown}
            aria-describedby={helpId}
            aria-invalid={!valid}
            onChange={(event) => setDraft(event.target.value)}
            className="min-h-12 w-32 rounded-xl border-2 border-vat-800 bg-white px-3 text-lg"
          />
        </div>
        <Button type="submit" disabled={!valid}>
          Set delay
        </Button>
      </div>
      <p className="font-bold">Now: {currentMs / 1000} s</p>
      {!valid ? (
        <p role="alert" className="font-bold text-madder-800">
          Use whole seconds from 0 to {maxSeconds}.
        </p>
      ) : null}
      {refusal ? (
        <p role="alert" className="font-bold text-madder-800">
          {refusal}
        </p>
      ) : null}
    </form>
  );
}
