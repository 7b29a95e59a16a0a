import type { Submission } from '@vatside/contracts/submissions';
import { Button } from '@vatside/ui/Button';
import { Card } from '@vatside/ui/Card';
import { FormAlert } from '@vatside/ui/form/FormAlert';
import { useState } from 'react';
import { useSetConsent, useWithdrawSkein } from '../api.ts';
import { bandWords, statusWords } from '../status.ts';
import { ConsentSwitch } from './ConsentSwitch.tsx';
import { SkeinEditForm } from './SkeinEditForm.tsx';

const shortDate = (iso: string) =>
  new Intl.DateTimeFormat('en-US', { dateStyle: 'medium' }).format(new Date(iso));

const statusTone: Record<Submission['status'], string> = {
  waiting: 'border-vat-700 bg-vat-100 text-vat-900',
  approved: 'border-leaf-700 bg-leaf-100 text-leaf-800',
  featured: 'border-leaf-700 bg-leaf-100 text-leaf-800',
  needsChanges: 'border-marigold-500 bg-marigold-100 text-vat-950',
  rejected: 'border-madder-700 bg-madder-100 text-madder-800',
};

/** One of my skeins: status in words, photos, and what I can do with it. */
export function SkeinCard({ slug, skein }: { slug: string; skein: Submission }) {
  const [editing, setEditing] = useState(false);
  const [confirming, setConfirming] = useState(false);
  const consent = useSetConsent(slug);
  const withdraw = useWithdrawSkein(slug);
  const status = statusWords[skein.status];
  const editable = skein.status === 'waiting' || skein.status === 'needsChanges';
  const titleId = `skein-${skein.id}`;
  const failure = consent.error ?? withdraw.error;

  return (
    <Card as="li" aria-labelledby={titleId} className="space-y-4">
      <div className="space-y-1">
        <h2 id={titleId} className="font-display text-2xl font-semibold">
          {skein.baseName}
        </h2>
        <p className="text-vat-800">
          {skein.colorway ? `${skein.colorway.name} · ` : ''}
          {skein.dyeAlong.title} · shared {shortDate(skein.createdAt)}
        </p>
      </div>
      <div className={`rounded-xl border-2 p-3 ${statusTone[skein.status]}`}>
        <p className="text-lg font-bold">{status.label}</p>
        {skein.reason ? <p className="mt-1">“{skein.reason}”</p> : null}
        <p className="mt-1">{status.detail}</p>
      </div>
      <ul className="flex flex-wrap gap-2" aria-label="Photos">
        {skein.photos.map((photo) => (
          <li key={photo.id}>
            <img
              src={photo.thumbUrl}
              width={photo.thumbWidth}
              height={photo.thumbHeight}
              alt={`Photo ${photo.position} of this skein`}
              className="h-24 w-auto rounded-lg border border-wool-200"
            />
          </li>
        ))}
      </ul>
      {skein.closeness ? <p className="font-bold">{bandWords[skein.closeness.band]}</p> : null}
      {failure ? <FormAlert>{failure.message}</FormAlert> : null}

      {editing ? (
        <SkeinEditForm slug={slug} skein={skein} onDone={() => setEditing(false)} />
      ) : (
        <>
          <ConsentSwitch
            shared
            checked={skein.consentToFeature}
            disabled={consent.isPending}
            onChange={(consentToFeature) => consent.mutate({ id: skein.id, consentToFeature })}
          />
          {skein.status === 'featured' && skein.consentToFeature ? (
            <p className="text-sm font-bold">
              It is in the recap now. Turning this off takes it out; it stays in the gallery.
            </p>
          ) : null}
          {editable ? (
            <Button variant="secondary" size="hand" onClick={() => setEditing(true)}>
              Change details or yarn area
            </Button>
          ) : null}
          {confirming ? (
            <div
              role="group"
              aria-label="Withdraw this skein?"
              className="space-y-3 rounded-xl border-2 border-madder-700 bg-madder-100 p-4"
            >
              <p className="font-bold text-madder-800">
                Withdraw this skein? Its photos and details are removed from Vatside everywhere: the
                gallery, the recap and the moderators’ queue. This cannot be undone.
              </p>
              <div className="grid gap-3 sm:grid-cols-2">
                <Button
                  variant="danger"
                  size="hand"
                  disabled={withdraw.isPending}
                  onClick={() => withdraw.mutate(skein)}
                >
                  {withdraw.isPending ? 'Withdrawing…' : 'Yes, withdraw it'}
                </Button>
                <Button variant="secondary" size="hand" onClick={() => setConfirming(false)}>
                  Keep it
                </Button>
              </div>
            </div>
          ) : (
            <Button variant="secondary" onClick={() => setConfirming(true)}>
              Withdraw…
            </Button>
          )}
        </>
      )}
    </Card>
  );
}
