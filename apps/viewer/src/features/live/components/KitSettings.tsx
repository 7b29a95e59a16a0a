import { useId, useState, type ReactNode } from 'react';
import { formatGrams, formatOunces } from '../utils/format.ts';
import { kitSchema, type Kit } from '../../../lib/kit.ts';

const systemWords = { us: 'US cups and spoons', metric: 'Metric spoons' } as const;
const dyeKindWords = { stock: 'I use stock solutions', foodColor: 'I use food color' } as const;

/** "My kit": the viewer's skein, units and dropper, set once on this phone. */
export function KitSettings({
  kit,
  onChange,
  askDyeKind,
}: {
  kit: Kit;
  onChange: (kit: Kit) => void;
  askDyeKind: boolean;
}) {
  const summary = `${formatGrams(kit.skeinWeightG)} skein (${formatOunces(kit.skeinWeightG)}) · ${
    kit.system === 'us' ? 'US' : 'metric'
  } measures · ${kit.dropsPerMl} drops per mL`;
  return (
    <details className="group rounded-card border-2 border-vat-800 bg-wool-50">
      <summary className="flex min-h-16 cursor-pointer list-none items-center justify-between gap-3 rounded-card px-4 py-2 [&::-webkit-details-marker]:hidden">
        <span>
          <span className="block text-xl font-bold">My kit</span>
          <span className="block text-base">{summary}</span>
        </span>
        <span aria-hidden="true" className="text-2xl group-open:rotate-180">
          ▾
        </span>
      </summary>
      <div className="space-y-5 border-t-2 border-wool-200 px-4 py-4">
        <NumberField
          label="Dry weight of your skein (g)"
          value={kit.skeinWeightG}
          hint={(g) => `That is ${formatOunces(g)}.`}
          isValid={(g) => kitSchema.shape.skeinWeightG.safeParse(g).success}
          invalidText="Give a weight between 1 and 5,000 g."
          onValid={(skeinWeightG) => onChange({ ...kit, skeinWeightG })}
        />
        <Choice
          legend="Measures"
          value={kit.system}
          options={systemWords}
          onChange={(system) => onChange({ ...kit, system })}
        />
        <NumberField
          label="Drops per mL for your dropper"
          value={kit.dropsPerMl}
          hint={() =>
            'About 20 for most droppers. Count drops into a 1 mL syringe to check; drops are always approximate.'
          }
          isValid={(n) => kitSchema.shape.dropsPerMl.safeParse(n).success}
          invalidText="Give a number between 1 and 100."
          onValid={(dropsPerMl) => onChange({ ...kit, dropsPerMl })}
        />
        {askDyeKind ? (
          <Choice
            legend="Your dyes"
            value={kit.dyeKind}
            options={dyeKindWords}
            onChange={(dyeKind) => onChange({ ...kit, dyeKind })}
          />
        ) : null}
      </div>
    </details>
  );
}

function NumberField({
  label,
  value,
  hint,
  isValid,
  invalidText,
  onValid,
}: {
  label: string;
  value: number;
  hint: (value: number) => ReactNode;
  isValid: (value: number) => boolean;
  invalidText: string;
  onValid: (value: number) => void;
}) {
  const id = useId();
  // What is being typed, which may be half a number ("1." or ""): only valid numbers are kept.
  const [text, setText] = useState(String(value));
  // A value set from elsewhere (the profile arriving) replaces the text, unless it says the same.
  const [shown, setShown] = useState(value);
  if (shown !== value) {
    setShown(value);
    if (Number(text) !== value) setText(String(value));
  }
  const typed = Number(text);
  const valid = text.trim() !== '' && isValid(typed);
  return (
    <div className="space-y-1">
      <label htmlFor={id} className="block text-lg font-bold">
        {label}
      </label>
      <input
        id={id}
        inputMode="decimal"
        value={text}
        aria-invalid={!valid}
        aria-describedby={`${id}-hint`}
        onChange={(event) => {
          setText(event.target.value);
          const next = Number(event.target.value);
          if (event.target.value.trim() !== '' && isValid(next)) onValid(next);
        }}
        className="min-h-14 w-40 rounded-xl border-2 border-vat-800 bg-white px-3 text-2xl font-bold"
      />
      <p id={`${id}-hint`} className={valid ? 'text-base' : 'text-base font-bold text-madder-800'}>
        {valid ? hint(typed) : invalidText}
      </p>
    </div>
  );
}

function Choice<V extends string>({
  legend,
  value,
  options,
  onChange,
}: {
  legend: string;
  /** Null while nothing is chosen yet. */
  value: V | null;
  options: Record<V, string>;
  onChange: (value: V) => void;
}) {
  const name = useId();
  return (
    <fieldset className="space-y-2">
      <legend className="text-lg font-bold">{legend}</legend>
      {(Object.entries(options) as Array<[V, string]>).map(([option, words]) => (
        <label
          key={option}
          className="flex min-h-14 cursor-pointer items-center gap-3 rounded-xl border-2 border-vat-800 bg-white px-4 has-checked:bg-vat-100 has-focus-visible:outline-3 has-focus-visible:outline-offset-3 has-focus-visible:outline-vat-700"
        >
          <input
            type="radio"
            name={name}
            value={option}
            checked={value === option}
            onChange={() => onChange(option)}
            className="size-6 accent-vat-800"
          />
          <span className="text-lg font-bold">{words}</span>
        </label>
      ))}
    </fieldset>
  );
}
