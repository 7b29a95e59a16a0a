import type { ReactNode } from 'react';
import { Card } from '../Card.tsx';

/** The narrow card every sign-in screen sits in: one task per screen. */
export function AccountFrame({
  title,
  intro,
  children,
}: {
  title: string;
  intro?: ReactNode;
  children: ReactNode;
}) {
  return (
    <Card as="section" aria-labelledby="account-frame-title" className="mx-auto max-w-lg space-y-5">
      <div className="space-y-2">
        <h1 id="account-frame-title" className="font-display text-3xl font-semibold">
          {title}
        </h1>
        {intro ? <div className="text-lg">{intro}</div> : null}
      </div>
      {children}
    </Card>
  );
}
