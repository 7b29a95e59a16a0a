import type { ReviewSubmission } from '@vatside/contracts/review';
import { Button } from '@vatside/ui/Button';
import { cx } from '@vatside/ui/cx.ts';
import type { Ref } from 'react';
import { SkeinPhoto } from './SkeinPhoto.tsx';
import { formatMoment } from '../../../lib/format.ts';
import { closenessNames, statusNames } from '../names.ts';

export type CardAction = 'approve' | 'needsChanges' | 'reject' | 'feature';

const fibers = (parts: ReviewSubmission['fiberContent']) =>
  parts.length ? parts.map((p) => `${p.pct} % ${p.fiber}`).join(', ') : 'Not given';

/** Why a skein cannot be featured, or null when it can. */
export function featureBlock(skein: ReviewSubmission): string | null {
  if (skein.status === 'featured') return null;
  if (!skein.consentToFeature)
    return `${skein.sharer.name} has not agreed to be featured, so this skein stays out of the recap. They can say yes on their skeins page.`;
  if (skein.status !== 'waiting' && skein.status !== 'approved')
    return `Only a waiting or approved skein can be featured; this one is ${statusNames[skein.status].toLowerCase()}.`;
  return null;
}

/** One shared skein in the queue: photos with the yarn area, what went into it, the buttons. */
export function SkeinCard({
  skein,
  current,
  selected,
  busy,
  ref,
  onFocus,
  onAction,
  onSelect,
}: {
  skein: ReviewSubmission;
  current: boolean;
  selected: boolean;
  busy: boolean;
  ref: Ref<HTMLElement>;
  onFocus: () => void;
  onAction: (action: CardAction) => void;
  onSelect: () => void;
}) {
  const who = skein.sharer.name;
  const blocked = featureBlock(skein);
  const noteId = `feature-note-${skein.id}`;
  return (
    <article
      ref={ref}
      tabIndex={current ? 0 : -1}
      aria-label={`Skein by ${who}`}
      aria-current={current ? 'true' : undefined}
      onFocus={onFocus}
      className={cx(
        'grid gap-4 rounded-card border-2 bg-wool-50 p-4 shadow-card md:grid-cols-[auto_1fr]',
        current ? 'border-vat-800 ring-4 ring-vat-200' : 'border-wool-200',
        selected && 'bg-vat-100',
      )}
    >
      <div className="flex gap-2 overflow-x-auto">
        {skein.photos.map((photo, i) => (
          <SkeinPhoto key={photo.id} photo={photo} alt={`Photo ${i + 1} of ${who}’s skein`} />
        ))}
      </div>
      <div className="min-w-0 space-y-3">
        <div className="flex flex-wrap items-start justify-between gap-2">
          <div>
            <h3 className="font-display text-xl font-semibold">{who}</h3>
            <p className="text-sm text-vat-800">
              {skein.dyeAlong.title} · shared {formatMoment(skein.createdAt)}
            </p>
          </div>
          <label className="inline-flex min-h-12 cursor-pointer items-center gap-2 rounded-xl border-2 border-vat-800 px-3 font-bold">
            <input type="checkbox" className="size-5" checked={selected} onChange={onSelect} />
            Select
          </label>
        </div>
        <dl className="grid gap-x-4 gap-y-1 sm:grid-cols-[auto_1fr]">
          <dt className="font-bold">Status</dt>
          <dd>
            {statusNames[skein.status]}
            {skein.reason ? <span className="text-vat-800"> — “{skein.reason}”</span> : null}
          </dd>
          <dt className="font-bold">Colorway</dt>
          <dd>{skein.colorway?.name ?? 'Their own idea'}</dd>
          <dt className="font-bold">Base</dt>
          <dd>{skein.baseName}</dd>
          <dt className="font-bold">Fiber</dt>
          <dd>{fibers(skein.fiberContent)}</dd>
          <dt className="font-bold">Dyes</dt>
          <dd>{skein.dyesUsed.length ? skein.dyesUsed.join(', ') : 'Not given'}</dd>
          <dt className="font-bold">Notes</dt>
          <dd className="whitespace-pre-line">{skein.notes || 'None'}</dd>
          <dt className="font-bold">Feature</dt>
          <dd>
            {skein.consentToFeature ? '✓ Agreed to be featured' : '✕ Not agreed to be featured'}
          </dd>
          <dt className="font-bold">Closeness</dt>
          <dd>
            {skein.closeness ? (
              <>
                <span className="font-bold">{closenessNames[skein.closeness.band]}</span>
                <span className="block text-sm text-vat-800">{skein.closeness.message}</span>
              </>
            ) : (
              'No inspiration palette to compare with'
            )}
          </dd>
        </dl>
        <div className="flex flex-wrap gap-2">
          <Button disabled={busy} onClick={() => onAction('approve')}>
            Approve
          </Button>
          <Button variant="secondary" disabled={busy} onClick={() => onAction('needsChanges')}>
            Ask for a change
          </Button>
          <Button variant="danger" disabled={busy} onClick={() => onAction('reject')}>
            Decline
          </Button>
          <Button
            variant="secondary"
            disabled={busy || blocked !== null}
            aria-describedby={blocked ? noteId : undefined}
            onClick={() => onAction('feature')}
          >
            {skein.status === 'featured' ? 'Stop featuring' : 'Feature'}
          </Button>
        </div>
        {blocked ? (
          <p id={noteId} className="text-sm text-vat-800">
            {blocked}
          </p>
        ) : null}
      </div>
    </article>
  );
}
