import type { MeasureSystem } from '@vatside/dye-kit';
import { cx } from '@vatside/ui/cx.ts';

const choices: { value: MeasureSystem; label: string }[] = [
  { value: 'us', label: 'US measures' },
  { value: 'metric', label: 'Metric' },
];

/** Which kitchen measures go beside the metric amounts. */
export function SystemSwitch({
  system,
  onChange,
}: {
  system: MeasureSystem;
  onChange: (system: MeasureSystem) => void;
}) {
  return (
    <div
      role="group"
      aria-label="Kitchen measures"
      className="inline-flex rounded-xl border-2 border-vat-800 p-1"
    >
      {choices.map((choice) => (
        <button
          key={choice.value}
          type="button"
          aria-pressed={system === choice.value}
          onClick={() => onChange(choice.value)}
          className={cx(
            'min-h-11 rounded-lg px-4 font-bold',
            system === choice.value ? 'bg-vat-800 text-wool-50' : 'text-vat-900 hover:bg-vat-100',
          )}
        >
          {choice.label}
        </button>
      ))}
    </div>
  );
}
