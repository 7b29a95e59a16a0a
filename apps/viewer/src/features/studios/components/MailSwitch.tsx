import { useId } from 'react';

/** A large on/off switch; the words say the state, not only the knob's position. */
export function MailSwitch({
  checked,
  disabled,
  onChange,
}: {
  checked: boolean;
  disabled: boolean;
  onChange: (checked: boolean) => void;
}) {
  const id = useId();
  return (
    <label
      htmlFor={id}
      className="flex min-h-16 cursor-pointer items-center justify-between gap-4 rounded-xl border-2 border-vat-800 bg-white px-4 has-focus-visible:outline-3 has-focus-visible:outline-offset-3 has-focus-visible:outline-vat-700"
    >
      <span>
        <span className="block font-bold">
          E-mail me about <span className="whitespace-nowrap">dye-alongs</span>
        </span>
        <span aria-hidden="true" className="block text-sm text-vat-800">
          {checked ? 'On' : 'Off'}
        </span>
      </span>
      <input
        id={id}
        type="checkbox"
        role="switch"
        checked={checked}
        disabled={disabled}
        onChange={(event) => onChange(event.target.checked)}
        className="peer sr-only"
      />
      <span
        aria-hidden="true"
        className="relative h-9 w-16 shrink-0 rounded-full border-2 border-vat-800 bg-wool-200 transition-colors peer-checked:bg-vat-700 after:absolute after:top-0.5 after:left-0.5 after:size-7 after:rounded-full after:bg-white after:shadow after:transition-transform peer-checked:after:translate-x-7"
      />
    </label>
  );
}
