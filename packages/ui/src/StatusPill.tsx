import type { ReactNode } from 'react';
import { cx } from './cx.ts';

export type StatusTone = 'ok' | 'fail';

const tones: Record<StatusTone, { className: string; glyph: string }> = {
  ok: { className: 'bg-leaf-100 text-leaf-800 border-leaf-700', glyph: '✓' },
  fail: { className: 'bg-madder-100 text-madder-800 border-madder-700', glyph: '✕' },
};

/** A short status label; the glyph and the words carry the meaning, never the color alone. */
export function StatusPill({ tone, children }: { tone: StatusTone; children: ReactNode }) {
  const { className, glyph } = tones[tone];
  return (
    <span
      className={cx(
        'inline-flex items-center gap-1.5 rounded-full border px-3 py-1 text-sm font-bold',
        className,
      )}
    >
      <span aria-hidden="true">{glyph}</span>
      {children}
    </span>
  );
}
