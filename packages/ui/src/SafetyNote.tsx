import { useId } from 'react';
import { cx } from './cx.ts';

/** Plain cautions for the places where dyeing happens. Not a substitute for the dye maker's sheet. */
export function SafetyNote({ className }: { className?: string }) {
  const titleId = useId();
  return (
    <aside
      aria-labelledby={titleId}
      className={cx(
        'rounded-card border-2 border-marigold-500 bg-marigold-100 p-4 text-vat-950',
        className,
      )}
    >
      <h2 id={titleId} className="flex items-center gap-2 font-bold">
        <span aria-hidden="true">⚠</span>
        Before you heat a pot
      </h2>
      <ul className="mt-2 list-disc space-y-1 pl-5">
        <li>Hot dye baths and steam scald. Keep handles turned in and children and pets away.</li>
        <li>
          Acids and dye powders irritate skin, eyes and lungs: wear gloves, and a dust mask while
          measuring powder.
        </li>
        <li>Pots, spoons and measures that touch non-food dye stay dyeing-only from then on.</li>
      </ul>
      <p className="mt-2">
        Follow your dye maker&apos;s safety data sheet, local wastewater rules and local codes.
      </p>
    </aside>
  );
}
