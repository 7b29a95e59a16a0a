import { useId } from 'react';

/**
 * Yes or no to being featured in the recap, off until the sharer turns it on. The words say
 * what it means and that it can be taken back; the state is spelled out, not only drawn.
 */
export function ConsentSwitch({
  checked,
  disabled = false,
  onChange,
  shared = false,
}: {
  checked: boolean;
  disabled?: boolean;
  onChange: (checked: boolean) => void;
  /** On a skein already shared (My skeins), rather than on the share form. */
  shared?: boolean;
}) {
  const id = useId();
  const explainId = `${id}-explain`;
  return (
    <div className="space-y-2">
      <label
        htmlFor={id}
        className="flex min-h-16 cursor-pointer items-center justify-between gap-4 rounded-xl border-2 border-vat-800 bg-white px-4 py-2 has-focus-visible:outline-3 has-focus-visible:outline-offset-3 has-focus-visible:outline-vat-700"
      >
        <span>
          <span className="block font-bold">The host may feature it in the recap</span>
          <span aria-hidden="true" className="block text-sm text-vat-800">
            {checked ? 'Yes' : 'No'}
          </span>
        </span>
        <input
          id={id}
          type="checkbox"
          role="switch"
          aria-describedby={explainId}
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
      <p id={explainId} className="text-sm text-vat-800">
        Yes means the host may show your photos, your name and your notes on screen in the month’s
        recap, which may be recorded.{' '}
        {shared
          ? 'Turning it off takes the skein out of the recap.'
          : 'You can turn it off at any time in My skeins; the skein then leaves the recap.'}
      </p>
    </div>
  );
}
