import { cx } from './cx.ts';

export type SwatchProps = {
  /** `#rrggbb` */
  hex: string;
  /** Always shown: a color never stands alone without words. */
  label: string;
  showHex?: boolean;
  className?: string;
};

export function Swatch({ hex, label, showHex = false, className }: SwatchProps) {
  return (
    <span className={cx('inline-flex items-center gap-3', className)}>
      <span
        aria-hidden="true"
        className="size-10 shrink-0 rounded-lg border-2 border-vat-950/30"
        style={{ backgroundColor: hex }}
      />
      <span className="leading-tight">
        <span className="block font-bold">{label}</span>
        {showHex ? <span className="block text-sm text-vat-800 uppercase">{hex}</span> : null}
      </span>
    </span>
  );
}
