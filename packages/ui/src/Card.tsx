import type { HTMLAttributes } from 'react';
import { cx } from './cx.ts';

export type CardProps = HTMLAttributes<HTMLElement> & {
  as?: 'div' | 'section' | 'article' | 'li';
  /** Off when the content runs edge to edge (e.g. a color band) and pads itself. */
  padded?: boolean;
};

export function Card({ as: Tag = 'div', padded = true, className, ...rest }: CardProps) {
  return (
    <Tag
      className={cx(
        'rounded-card border border-wool-200 bg-wool-50 shadow-card',
        padded && 'p-5 sm:p-6',
        className,
      )}
      {...rest}
    />
  );
}
