import { Button } from '@vatside/ui/Button';
import { SelectField } from '@vatside/ui/form/SelectField';
import { TextField } from '@vatside/ui/form/TextField';
import { useId, useState, type FormEvent } from 'react';
import type { ArchiveSearch } from '../api.ts';

const HEX = /^#[0-9a-fA-F]{6}$/;

type Choice = { id: string; name: string };

/** Month, a color (picker or hex), a base and a dye; every field may stay empty. */
export function ArchiveSearchForm({
  initial,
  bases,
  dyes,
  onSearch,
}: {
  initial: ArchiveSearch;
  bases: Choice[];
  dyes: Choice[];
  onSearch: (search: ArchiveSearch) => void;
}) {
  const [month, setMonth] = useState(initial.month ?? '');
  const [hex, setHex] = useState(initial.hex ?? '');
  const [baseId, setBaseId] = useState(initial.baseId ?? '');
  const [dyeId, setDyeId] = useState(initial.dyeId ?? '');
  const [hexError, setHexError] = useState<string>();
  const pickerId = useId();

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const color = hex.trim();
    if (color && !HEX.test(color)) {
      setHexError('Use a color like #1f6f78, or clear the field.');
      return;
    }
    setHexError(undefined);
    onSearch({
      ...(month ? { month } : {}),
      ...(color ? { hex: color.toLowerCase() } : {}),
      ...(baseId ? { baseId } : {}),
      ...(dyeId ? { dyeId } : {}),
    });
  };

  return (
    <form noValidate onSubmit={submit} aria-label="Search the archive" className="space-y-4">
      <div className="grid gap-4 md:grid-cols-2 xl:grid-cols-4">
        <TextField
          label="Month dyed"
          hint="Leave empty for every month."
          type="month"
          value={month}
          onChange={(e) => setMonth(e.target.value)}
        />
        <div className="flex items-end gap-3">
          <div className="space-y-1">
            <label htmlFor={pickerId} className="block font-bold">
              Pick a color
            </label>
            <input
              id={pickerId}
              type="color"
              value={HEX.test(hex) ? hex : '#1f6f78'}
              onChange={(e) => setHex(e.target.value)}
              className="block h-12 w-16 cursor-pointer rounded-xl border-2 border-vat-800 bg-white"
            />
          </div>
          <TextField
            label="Color (hex)"
            hint="Nearest colors first."
            placeholder="#1f6f78"
            value={hex}
            error={hexError}
            onChange={(e) => setHex(e.target.value)}
            className="flex-1"
          />
        </div>
        <SelectField label="Base" value={baseId} onChange={(e) => setBaseId(e.target.value)}>
          <option value="">Any base</option>
          {bases.map((b) => (
            <option key={b.id} value={b.id}>
              {b.name}
            </option>
          ))}
        </SelectField>
        <SelectField label="Dye" value={dyeId} onChange={(e) => setDyeId(e.target.value)}>
          <option value="">Any dye</option>
          {dyes.map((d) => (
            <option key={d.id} value={d.id}>
              {d.name}
            </option>
          ))}
        </SelectField>
      </div>
      <div className="flex flex-wrap gap-3">
        <Button type="submit">Search the archive</Button>
        <Button
          variant="secondary"
          onClick={() => {
            setMonth('');
            setHex('');
            setBaseId('');
            setDyeId('');
            setHexError(undefined);
            onSearch({});
          }}
        >
          Show everything
        </Button>
      </div>
    </form>
  );
}
