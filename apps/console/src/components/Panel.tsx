import { Card } from '@vatside/ui/Card';
import { useId, type ReactNode } from 'react';

/** A titled region of a workbench screen. */
export function Panel({
  title,
  intro,
  actions,
  children,
}: {
  title: string;
  intro?: ReactNode;
  actions?: ReactNode;
  children: ReactNode;
}) {
  const titleId = useId();
  return (
    <Card as="section" aria-labelledby={titleId} className="min-w-0 space-y-4">
      <div className="flex flex-wrap items-start justify-between gap-3">
        <div className="space-y-1">
          <h2 id={titleId} className="font-display text-2xl font-semibold">
            {title}
          </h2>
          {intro ? <div className="text-vat-800">{intro}</div> : null}
        </div>
        {actions}
      </div>
      {children}
    </Card>
  );
}
