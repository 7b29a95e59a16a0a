import { cx } from './cx.ts';

export type CautionKind = 'hotBath' | 'acid' | 'powder' | 'none';

/** Plain words for each caution a run-sheet step can carry. */
export const cautionWords: Record<Exclude<CautionKind, 'none'>, { title: string; text: string }> = {
  hotBath: {
    title: 'Hot bath',
    text: 'Steam and hot dye water scald. Lift yarn with tongs, keep the handle turned in.',
  },
  acid: {
    title: 'Acid',
    text: 'Add acid to the water, never water to acid. Gloves on; rinse splashes at once.',
  },
  powder: {
    title: 'Dye powder',
    text: 'Mask and gloves while measuring powder; wipe the surface damp afterward.',
  },
};

/** A step's caution in words, never by color alone. Renders nothing for "none". */
export function StepCaution({ kind, className }: { kind: CautionKind; className?: string }) {
  if (kind === 'none') return null;
  const { title, text } = cautionWords[kind];
  return (
    <p
      className={cx(
        'rounded-xl border-2 border-marigold-500 bg-marigold-100 px-3 py-2 text-vat-950',
        className,
      )}
    >
      <span className="font-bold">
        <span aria-hidden="true">⚠ </span>Caution · {title}:
      </span>{' '}
      {text}
    </p>
  );
}
