import { useId, type ReactNode, type Ref, type SelectHTMLAttributes } from 'react';
import { cx } from '../cx.ts';
import { FieldError, fieldInputClass } from './TextField.tsx';

export type SelectFieldProps = SelectHTMLAttributes<HTMLSelectElement> & {
  label: string;
  hint?: ReactNode;
  error?: string | undefined;
  ref?: Ref<HTMLSelectElement>;
};

export function SelectField({ label, hint, error, className, ref, children, ...select }: SelectFieldProps) {
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
        <div id={hintId} className="text-sm text-vat-800">
          {hint}
        </div>
      ) : null}
      <select
        id={id}
        ref={ref}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy}
        className={fieldInputClass}
        {...select}
      >
        {children}
      </select>
      <FieldError id={errorId} message={error} />
    </div>
  );
}
