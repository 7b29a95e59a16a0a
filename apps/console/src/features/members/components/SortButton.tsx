import type { ReactNode } from 'react';

/** A column header that sorts; the th around it carries aria-sort for screen readers. */
export function SortButton({
  sorted,
  onClick,
  children,
}: {
  sorted: false | 'asc' | 'desc';
  onClick: ((event: unknown) => void) | undefined;
  children: ReactNode;
}) {
  return (
    <button
      type="button"
      onClick={onClick}
      className="inline-flex min-h-12 items-center gap-2 rounded-lg px-2 font-bold hover:bg-vat-100"
    >
      {children}
      <span aria-hidden="true" className="w-4 text-vat-700">
        {sorted === 'asc' ? '▲' : sorted === 'desc' ? '▼' : '↕'}
      </span>
    </button>
  );
}
