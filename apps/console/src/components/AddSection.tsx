import type { ReactNode } from 'react';

/** The "add one" form under a list, set apart so it is not mistaken for the list. */
export function AddSection({ title, children }: { title: string; children: ReactNode }) {
  return (
    <div className="space-y-3 rounded-xl border-2 border-dashed border-wool-300 p-4">
      <h3 className="text-xl font-bold">{title}</h3>
      {children}
    </div>
  );
}
