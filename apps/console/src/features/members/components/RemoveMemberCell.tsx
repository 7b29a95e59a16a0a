import { Button } from '@vatside/ui/Button';
import { useEffect, useRef, useState } from 'react';

/** Removing someone takes two presses: a slip of a wet finger should not do it. */
export function RemoveMemberCell({
  name,
  busy,
  onRemove,
}: {
  name: string;
  busy: boolean;
  onRemove: () => void;
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
        aria-label={`Remove ${name}`}
        onClick={() => setAsking(true)}
        disabled={busy}
      >
        Remove
      </Button>
    );
  }
  return (
    <div role="group" aria-label={`Remove ${name}?`} className="flex items-center gap-2">
      <Button
        variant="danger"
        onClick={() => {
          setAsking(false);
          onRemove();
        }}
      >
        Yes, remove
      </Button>
      <Button ref={keepRef} variant="secondary" onClick={() => setAsking(false)}>
        Keep
      </Button>
    </div>
  );
}
