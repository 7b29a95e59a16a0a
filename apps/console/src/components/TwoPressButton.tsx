import { Button } from '@vatside/ui/Button';
import { useEffect, useRef, useState } from 'react';

/** A destructive action takes two presses: a slip of a wet finger should not do it. */
export function TwoPressButton({
  label,
  confirm,
  busy = false,
  onConfirm,
}: {
  /** e.g. "Delete Merino sock"; the first button's accessible name. */
  label: string;
  /** e.g. "Yes, delete". */
  confirm: string;
  busy?: boolean;
  onConfirm: () => void;
}) {
  const [asking, setAsking] = useState(false);
  const keepRef = useRef<HTMLButtonElement>(null);
  useEffect(() => {
    if (asking) keepRef.current?.focus();
  }, [asking]);

  if (!asking) {
    return (
      <Button
        variant="secondary"
        aria-label={label}
        disabled={busy}
        onClick={() => setAsking(true)}
      >
        {busy ? 'Working…' : label.split(' ')[0]}
      </Button>
    );
  }
  return (
    <div role="group" aria-label={`${label}?`} className="flex flex-wrap items-center gap-2">
      <Button
        variant="danger"
        onClick={() => {
          setAsking(false);
          onConfirm();
        }}
      >
        {confirm}
      </Button>
      <Button ref={keepRef} variant="secondary" onClick={() => setAsking(false)}>
        Keep
      </Button>
    </div>
  );
}
