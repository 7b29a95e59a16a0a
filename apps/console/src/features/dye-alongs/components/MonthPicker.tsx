import { addMonths, format, parse } from 'date-fns';
import { Button } from '@vatside/ui/Button';
import { fieldInputClass } from '@vatside/ui/form/FieldFrame';
import { useId } from 'react';

const MONTH = 'yyyy-MM';
const shift = (month: string, by: number) =>
  format(addMonths(parse(month, MONTH, new Date(2000, 0, 1)), by), MONTH);

/** "2026-12" → "December 2026". */
export const monthName = (month: string) =>
  format(parse(month, MONTH, new Date(2000, 0, 1)), 'MMMM yyyy');

/** One month at a time: a step back, a step on, or straight to a month. */
export function MonthPicker({
  month,
  onChange,
}: {
  month: string;
  onChange: (month: string) => void;
}) {
  const id = useId();
  return (
    <div className="flex flex-wrap items-end gap-2">
      <Button
        variant="secondary"
        aria-label={`Previous month, ${monthName(shift(month, -1))}`}
        onClick={() => onChange(shift(month, -1))}
      >
        <span aria-hidden="true">←</span>
      </Button>
      <div className="space-y-1">
        <label htmlFor={id} className="block font-bold">
          Month
        </label>
        <input
          id={id}
          type="month"
          value={month}
          required
          onChange={(event) => {
            if (/^\d{4}-\d{2}$/.test(event.target.value)) onChange(event.target.value);
          }}
          className={fieldInputClass}
        />
      </div>
      <Button
        variant="secondary"
        aria-label={`Next month, ${monthName(shift(month, 1))}`}
        onClick={() => onChange(shift(month, 1))}
      >
        <span aria-hidden="true">→</span>
      </Button>
    </div>
  );
}
