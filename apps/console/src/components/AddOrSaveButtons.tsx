import { Button } from '@vatside/ui/Button';

/**
 * The submit of a form that adds an item, or, opened from a row with "Change", saves that item
 * and offers Cancel beside it.
 */
export function AddOrSaveButtons({
  addLabel,
  changing,
  submitting,
  onCancel,
}: {
  addLabel: string;
  changing: boolean;
  submitting: boolean;
  onCancel?: () => void;
}) {
  return (
    <div className="flex flex-wrap gap-3">
      <Button type="submit" disabled={submitting}>
        {changing ? (submitting ? 'Saving…' : 'Save changes') : submitting ? 'Adding…' : addLabel}
      </Button>
      {changing ? (
        <Button variant="secondary" onClick={onCancel} disabled={submitting}>
          Cancel
        </Button>
      ) : null}
    </div>
  );
}
