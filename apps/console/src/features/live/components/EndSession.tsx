import type { HostAction } from '@vatside/contracts/live';
import { Button } from '@vatside/ui/Button';
import { useEffect, useRef, useState } from 'react';

/** Ending takes a second, deliberate press: a wet slip must not end the hour. */
export function EndSession({
  rehearsal,
  refusal,
  onSend,
}: {
  rehearsal: boolean;
  refusal: string | undefined;
  onSend: (action: HostAction) => Promise<boolean>;
}) {
  const [asking, setAsking] = useState(false);
  const keepRef = useRef<HTMLButtonElement>(null);
  useEffect(() => {
    if (asking) keepRef.current?.focus();
  }, [asking]);
  const what = rehearsal ? 'rehearsal' : 'live session';

  return (
    <div className="space-y-2">
      {asking ? (
        <div role="group" aria-label={`End the ${what}?`} className="space-y-2">
          <p className="font-bold">
            {rehearsal
              ? 'End the rehearsal? It will be discarded: nothing of it is kept in the month.'
              : 'End the live session? Every phone sees that it has ended, and the pots stop here.'}
          </p>
          <div className="flex flex-wrap gap-2">
            <Button
              variant="danger"
              onClick={() => {
                setAsking(false);
                void onSend({ type: 'session:end' });
              }}
            >
              Yes, end the {what}
            </Button>
            <Button ref={keepRef} variant="secondary" onClick={() => setAsking(false)}>
              Keep going
            </Button>
          </div>
        </div>
      ) : (
        <Button variant="danger" onClick={() => setAsking(true)}>
          End the {what}…
        </Button>
      )}
      {refusal ? (
        <p role="alert" className="font-bold text-madder-800">
          {refusal}
        </p>
      ) : null}
    </div>
  );
}
