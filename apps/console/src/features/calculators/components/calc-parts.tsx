import { DyeKitError, type MeasureSystem } from '@vatside/dye-kit';
import { TextField } from '@vatside/ui/form/TextField';
import type { ReactNode } from 'react';

export type CalcProps = { system: MeasureSystem };

/** Runs a dye-kit computation; its own error message explains bad input in plain words. */
export function attempt<T>(
  compute: () => T,
): { value: T; problem?: undefined } | { value?: undefined; problem: string } {
  try {
    return { value: compute() };
  } catch (error) {
    if (error instanceof DyeKitError) return { problem: error.message };
    throw error;
  }
}

/** Typed text as a number; blank or unreadable is NaN, which dye-kit refuses by name. */
export const toNumber = (text: string) => (text.trim() === '' ? Number.NaN : Number(text));

export function NumberInput({
  label,
  value,
  onChange,
  suffix,
  hint,
  className,
}: {
  label: string;
  value: string;
  onChange: (text: string) => void;
  suffix: string;
  hint?: string;
  className?: string;
}) {
  return (
    <TextField
      label={label}
      hint={hint}
      type="number"
      inputMode="decimal"
      step="any"
      min={0}
      suffix={suffix}
      className={className}
      value={value}
      onChange={(event) => onChange(event.target.value)}
    />
  );
}

/** The answer, large enough to read from the stove; or why there is none yet. */
export function Answer({
  problem,
  children,
}: {
  problem?: string | undefined;
  children: ReactNode;
}) {
  return (
    <div aria-live="polite" className="rounded-xl border-2 border-vat-600 bg-vat-100 p-4">
      {problem ? <p className="font-bold text-madder-800">{problem}</p> : children}
    </div>
  );
}

/** The formula used, in small print, with where it comes from. */
export function Formula({ children }: { children: ReactNode }) {
  return <p className="text-sm text-vat-800">Formula: {children}</p>;
}
