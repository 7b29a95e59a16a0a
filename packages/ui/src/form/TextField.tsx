import type { InputHTMLAttributes, Ref } from 'react';
import { FieldFrame, fieldInputClass } from './FieldFrame.tsx';

export type TextFieldProps = InputHTMLAttributes<HTMLInputElement> & {
  label: string;
  /** Shown under the label, before the person types. */
  hint?: string;
  error?: string | undefined;
  /** Text shown right after the input, e.g. a unit conversion. */
  suffix?: string;
  ref?: Ref<HTMLInputElement>;
};

export function TextField({ label, hint, error, suffix, className, ...input }: TextFieldProps) {
  return (
    <FieldFrame label={label} hint={hint} error={error} className={className}>
      {(control) => (
        <div className="flex items-center gap-3">
          <input className={fieldInputClass} {...input} {...control} />
          {suffix ? <span className="shrink-0 font-bold text-vat-800">{suffix}</span> : null}
        </div>
      )}
    </FieldFrame>
  );
}
