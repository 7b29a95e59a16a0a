import { useId, type ReactNode } from 'react';
import { cx } from '../cx.ts';

/** What a control needs to be tied to its label, hint and error. */
export type FieldControl = { id: string; 'aria-describedby'?: string; 'aria-invalid'?: true };

export const fieldInputClass =
  'min-h-12 w-full rounded-xl border-2 border-vat-800 bg-white px-4 text-lg text-vat-950 aria-[invalid=true]:border-madder-700';

/** Label above, hint under it, error under the control; the control gets the ids for all. */
export function FieldFrame({
  label,
  hint,
  error,
  className,
  children,
}: {
  label: string;
  hint?: ReactNode;
  error?: string | undefined;
  className?: string | undefined;
  children: (control: FieldControl) => ReactNode;
}) {
  const id = useId();
  const hintId = `${id}-hint`;
  const errorId = `${id}-error`;
  const describedBy = [hint && hintId, error && errorId].filter(Boolean).join(' ');
  return (
    <div className={cx('space-y-1', className)}>
      <label htmlFor={id} className="block font-bold">
        {label}
      </label>
      {hint ? (
        <div id={hintId} className="text-sm text-vat-800">
          {hint}
        </div>
      ) : null}
      {children({
        id,
        ...(describedBy ? { 'aria-describedby': describedBy } : {}),
        ...(error ? { 'aria-invalid': true as const } : {}),
      })}
      {error ? (
        <p id={errorId} className="flex items-center gap-1.5 font-bold text-madder-700">
          <span aria-hidden="true">✕</span>
          {error}
        </p>
      ) : null}
    </div>
  );
}
