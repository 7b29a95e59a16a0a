import { Button } from '@vatside/ui/Button';
import { SelectField } from '@vatside/ui/form/SelectField';
import { TextField } from '@vatside/ui/form/TextField';
import { formatQuantity } from '@vatside/ui/supplies/format.ts';
import { useState, type FormEvent } from 'react';

type Base = { id: string; name: string; skeinWeightG: number };
type Pot = { id: string; name: string; capacityMl: number };

export interface DyeAgainTarget {
  baseId: string;
  skeins: number;
  potId: string;
}

/** N skeins of a base in a pot: opens the batch sheet worked out from the actual amounts. */
export function DyeAgainForm({
  bases,
  pots,
  initialBaseId,
  onOpen,
}: {
  bases: Base[];
  pots: Pot[];
  initialBaseId: string | null;
  onOpen: (target: DyeAgainTarget) => void;
}) {
  const [baseId, setBaseId] = useState(
    initialBaseId && bases.some((b) => b.id === initialBaseId)
      ? initialBaseId
      : (bases[0]?.id ?? ''),
  );
  const [skeins, setSkeins] = useState('1');
  const [potId, setPotId] = useState('');
  const [error, setError] = useState<string>();

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const count = Number(skeins);
    if (!Number.isInteger(count) || count < 1 || count > 100) {
      setError('Give a whole number of skeins, 1 to 100.');
      return;
    }
    setError(undefined);
    onOpen({ baseId, skeins: count, potId });
  };

  if (bases.length === 0) return <p>Add a base on the workbench to dye this colorway again.</p>;
  return (
    <form noValidate onSubmit={submit} aria-label="Dye again" className="space-y-4">
      <div className="grid gap-4 md:grid-cols-3">
        <SelectField label="Base" value={baseId} onChange={(e) => setBaseId(e.target.value)}>
          {bases.map((b) => (
            <option key={b.id} value={b.id}>
              {b.name} ({formatQuantity(b.skeinWeightG)} g skeins)
            </option>
          ))}
        </SelectField>
        <TextField
          label="Skeins"
          type="number"
          inputMode="numeric"
          min={1}
          max={100}
          step={1}
          value={skeins}
          error={error}
          onChange={(e) => setSkeins(e.target.value)}
        />
        <SelectField label="Pot" value={potId} onChange={(e) => setPotId(e.target.value)}>
          <option value="">The colorway’s own pot</option>
          {pots.map((p) => (
            <option key={p.id} value={p.id}>
              {p.name} ({formatQuantity(p.capacityMl / 1000)} L)
            </option>
          ))}
        </SelectField>
      </div>
      <Button type="submit">Open the batch sheet</Button>
    </form>
  );
}
