import type { FiberName } from '@vatside/dye-kit';
import { FIBER_NAMES } from '@vatside/dye-kit';
import { Button } from '@vatside/ui/Button';
import { SelectField } from '@vatside/ui/form/SelectField';
import { TextField } from '@vatside/ui/form/TextField';

export type FiberRow = { fiber: FiberName | ''; pct: string };

const fiberWords: Record<FiberName, string> = {
  wool: 'Wool',
  alpaca: 'Alpaca',
  mohair: 'Mohair',
  silk: 'Silk',
  angora: 'Angora',
  cashmere: 'Cashmere',
  yak: 'Yak',
  nylon: 'Nylon',
  cotton: 'Cotton',
  linen: 'Linen',
  bambooViscose: 'Bamboo viscose',
  acrylic: 'Acrylic',
  polyester: 'Polyester',
};

const MAX_ROWS = 3;

/** What the yarn is made of: up to three fibers with their percentages, or "not sure". */
export function FiberRows({
  rows,
  onChange,
  error,
}: {
  rows: FiberRow[];
  onChange: (rows: FiberRow[]) => void;
  error?: string | undefined;
}) {
  const set = (i: number, row: Partial<FiberRow>) =>
    onChange(rows.map((r, j) => (j === i ? { ...r, ...row } : r)));
  return (
    <fieldset className="space-y-3">
      <legend className="font-bold">Fiber</legend>
      <p className="text-sm text-vat-800">From the yarn’s label, if you have it.</p>
      {rows.map((row, i) => (
        <div key={i} className="grid grid-cols-[1fr_7rem] items-end gap-3">
          <SelectField
            label={i === 0 ? 'Main fiber' : `Fiber ${i + 1}`}
            value={row.fiber}
            onChange={(e) => set(i, { fiber: e.target.value as FiberName | '' })}
          >
            <option value="">{i === 0 ? 'Not sure' : 'None'}</option>
            {FIBER_NAMES.map((f) => (
              <option key={f} value={f}>
                {fiberWords[f]}
              </option>
            ))}
          </SelectField>
          <TextField
            label="Percent"
            inputMode="decimal"
            value={row.pct}
            disabled={row.fiber === ''}
            onChange={(e) => set(i, { pct: e.target.value })}
            suffix="%"
          />
        </div>
      ))}
      {error ? (
        <p className="flex items-center gap-1.5 font-bold text-madder-700">
          <span aria-hidden="true">✕</span>
          {error}
        </p>
      ) : null}
      {rows.length < MAX_ROWS && rows.every((r) => r.fiber !== '') ? (
        <Button variant="secondary" onClick={() => onChange([...rows, { fiber: '', pct: '' }])}>
          Add another fiber
        </Button>
      ) : null}
    </fieldset>
  );
}

/** The rows as the contract wants them, or the reason they cannot be sent. */
export function fiberContentOf(
  rows: FiberRow[],
): { ok: true; value: { fiber: FiberName; pct: number }[] } | { ok: false; error: string } {
  const chosen = rows.filter((r): r is { fiber: FiberName; pct: string } => r.fiber !== '');
  const value = chosen.map((r) => ({ fiber: r.fiber, pct: Number(r.pct.replace(',', '.')) }));
  if (value.some((v) => !Number.isFinite(v.pct) || v.pct <= 0 || v.pct > 100)) {
    return { ok: false, error: 'Give each fiber a percent from 1 to 100.' };
  }
  if (new Set(value.map((v) => v.fiber)).size !== value.length) {
    return { ok: false, error: 'List each fiber once.' };
  }
  if (value.length > 0 && Math.abs(value.reduce((t, v) => t + v.pct, 0) - 100) > 0.5) {
    return { ok: false, error: 'The percents should add up to 100.' };
  }
  return { ok: true, value };
}

/** Back from the stored content to rows, for editing. */
export function fiberRowsOf(content: { fiber: string; pct: number }[]): FiberRow[] {
  if (content.length === 0) return [{ fiber: '', pct: '100' }];
  return content.map((c) => ({ fiber: c.fiber as FiberName, pct: String(c.pct) }));
}
