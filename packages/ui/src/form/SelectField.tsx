import type { ReactNode, Ref, SelectHTMLAttributes } from 'react';
import { FieldFrame, fieldInputClass } from './FieldFrame.tsx';

export type SelectFieldProps = SelectHTMLAttributes<HTMLSelectElement> & {
  label: string;
  hint?: ReactNode;
  error?: string | undefined;
  ref?: Ref<HTMLSelectElement>;
};

export function SelectField({
  label,
  hint,
  error,
  className,
  children,
  ...select
}: SelectFieldProps) {
  return (
    <FieldFrame label={label} hint={hint} error={error} className={className}>
      {(control) => (
        <select className={fieldInputClass} {...select} {...control}>
          {children}
        </select>
      )}
    </FieldFrame>
  );
}
