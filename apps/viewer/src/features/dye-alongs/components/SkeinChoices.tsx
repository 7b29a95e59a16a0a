import { convert, type MeasureSystem } from '@vatside/dye-kit';
import { Button } from '@vatside/ui/Button';
import { Card } from '@vatside/ui/Card';
import { cx } from '@vatside/ui/cx.ts';
import { FormAlert } from '@vatside/ui/form/FormAlert';
import { TextField } from '@vatside/ui/form/TextField';
import { useState, type FormEvent } from 'react';

/** Skein sizes people dye most (common practice): minis, the usual 100 g, sock and big skeins. */
const commonWeightsG = [50, 100, 115, 150] as const;
const systems: { value: MeasureSystem; label: string }[] = [
  { value: 'us', label: 'US measures' },
  { value: 'metric', label: 'Metric' },
];

const choiceClass = (on: boolean) =>
  cx(
    'min-h-14 rounded-xl border-2 border-vat-800 px-1 text-lg font-bold whitespace-nowrap',
    on ? 'bg-vat-800 text-wool-50' : 'bg-white text-vat-900 hover:bg-vat-100',
  );

/** The skein the amounts are for and the measures they are written in; remembered per person. */
export function SkeinChoices({
  weightOfGoodsG,
  system,
  signedIn,
  saveError,
  onChange,
}: {
  weightOfGoodsG: number;
  system: MeasureSystem;
  signedIn: boolean;
  saveError: Error | null;
  onChange: (next: { weightOfGoodsG?: number; system?: MeasureSystem }) => void;
}) {
  const [other, setOther] = useState('');
  const [problem, setProblem] = useState<string>();
  const useOther = (event: FormEvent) => {
    event.preventDefault();
    const grams = Number(other);
    if (!Number.isInteger(grams) || grams < 5 || grams > 2_000) {
      setProblem('Give whole grams between 5 and 2,000.');
      return;
    }
    setProblem(undefined);
    onChange({ weightOfGoodsG: grams });
  };
  return (
    <Card as="section" aria-labelledby="skein-title" className="space-y-4">
      <div>
        <h2 id="skein-title" className="font-display text-2xl font-semibold">
          Your skein
        </h2>
        <p className="text-vat-800">
          Amounts below are for one {weightOfGoodsG} g skein (
          {Math.round(convert(weightOfGoodsG, 'g', 'oz') * 100) / 100} oz) of each colorway.{' '}
          {signedIn ? 'Saved to your profile.' : 'Kept on this phone.'}
        </p>
      </div>
      {saveError ? <FormAlert>{saveError.message}</FormAlert> : null}
      <div role="group" aria-label="Skein weight" className="grid grid-cols-4 gap-2">
        {commonWeightsG.map((grams) => (
          <button
            key={grams}
            type="button"
            aria-pressed={weightOfGoodsG === grams}
            onClick={() => onChange({ weightOfGoodsG: grams })}
            className={choiceClass(weightOfGoodsG === grams)}
          >
            {grams} g
          </button>
        ))}
      </div>
      <form noValidate onSubmit={useOther} className="flex items-end gap-2">
        <TextField
          label="Another weight"
          type="number"
          inputMode="numeric"
          suffix="g"
          className="min-w-0 flex-1"
          value={other}
          error={problem}
          onChange={(event) => setOther(event.target.value)}
        />
        <Button type="submit" variant="secondary" className="min-h-12">
          Use it
        </Button>
      </form>
      <div role="group" aria-label="Measures" className="grid grid-cols-2 gap-2">
        {systems.map((choice) => (
          <button
            key={choice.value}
            type="button"
            aria-pressed={system === choice.value}
            onClick={() => onChange({ system: choice.value })}
            className={choiceClass(system === choice.value)}
          >
            {choice.label}
          </button>
        ))}
      </div>
    </Card>
  );
}
