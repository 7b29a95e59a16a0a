import { useId, type InputHTMLAttributes, type Ref } from 'react';
import { cx } from '../cx.ts';

export type TextFieldProps = InputHTMLAttributes<HTMLInputElement> & {
  label: string;
  /** Shown under the label, before the person types. */
  hint?: string;
  error?: string | undefined;
  /** Text shown right after the input, e.g. a unit conversion. */
  suffix?: string;
  ref?: Ref<HTMLInputElement>;
};

export const fieldInputClass =
  'min-h-12 w-full rounded-xl border-2 border-vat-800 bg-white px-4 text-lg text-vat-950 aria-[invalid=true]:border-madder-700';

/** A labeled input with its hint and error tied to it for screen readers. */
export function TextField({ label, hint, error, suffix, className, ref, ...input }: TextFieldProps) {
  const id = useId();
  const hintId = `${id}-hint`;
  const errorId = `${id}-error`;
  const describedBy = [hint && hintId, error && errorId].filter(Boolean).join(' ') || undefined;
  return (
    <div className={cx('space-y-1', className)}>
      <label htmlFor={id} className="block font-bold">
        {label}
      </label>
      {hint ? (
        <p id={hintId} className="text-sm text-vat-800">
          {hint}
        </p>
      ) : null}
      <div className="flex items-center gap-3">
        <input
          id={id}
          ref={ref}
          aria-invalid={error ? true : undefined}
          aria-describedby={describedBy}
          className={fieldInputClass}
          {...input}
        />
        {suffix ? <span className="shrink-0 font-bold text-vat-800">{suffix}</span> : null}
      </div>
      <FieldError id={errorId} message={error} />
    </div>
  );
}

export function FieldError({ id, message }: { id: string; message?: string | undefined }) {
  if (!message) return null;
  return (
    <p id={id} className="flex items-center gap-1.5 font-bold text-madder-700">
      <span aria-hidden="true">✕</span>
      {message}
    </p>
  );
}
