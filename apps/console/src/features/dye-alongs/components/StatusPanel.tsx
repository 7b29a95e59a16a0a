import type { DyeAlongDetail, DyeAlongStatus } from '@vatside/contracts/dye-alongs';
import { Button } from '@vatside/ui/Button';
import { FormAlert } from '@vatside/ui/form/FormAlert';
import { useEffect, useRef, useState } from 'react';
import { useMoveDyeAlong } from '../api.ts';
import { moveNames, statusNames } from './names.ts';
import { StatusBadge } from './StatusBadge.tsx';

/** Where the dye-along stands, the moves it may make next, and why a move is not open yet. */
export function StatusPanel({
  slug,
  dyeAlong,
  canMove,
}: {
  slug: string;
  dyeAlong: DyeAlongDetail;
  canMove: boolean;
}) {
  const move = useMoveDyeAlong(slug, dyeAlong.id);
  // Announcing e-mails every follower: it takes a second press.
  const [confirming, setConfirming] = useState<DyeAlongStatus>();
  const confirmRef = useRef<HTMLButtonElement>(null);
  useEffect(() => {
    if (confirming) confirmRef.current?.focus();
  }, [confirming]);

  const go = (to: DyeAlongStatus) => {
    setConfirming(undefined);
    move.mutate(to);
  };

  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-center gap-3">
        <span className="font-bold">Now:</span>
        <StatusBadge status={dyeAlong.status} />
        <span className="text-vat-800">{statusNames[dyeAlong.status].hint}</span>
      </div>
      <MailCounts mail={dyeAlong.mail} announced={dyeAlong.announcedAt !== null} />
      {move.error ? (
        <FormAlert>
          <span className="block">That move was refused.</span>
          <span className="block font-normal">{move.error.message}</span>
        </FormAlert>
      ) : null}
      {canMove ? (
        <ul className="space-y-3" aria-label="Next steps">
          {dyeAlong.nextStatuses.map((next) => (
            <li key={next.to} className="space-y-2">
              {confirming === next.to ? (
                <div
                  role="group"
                  aria-label={`${moveNames[next.to]}?`}
                  className="flex flex-wrap gap-2"
                >
                  <Button ref={confirmRef} onClick={() => go(next.to)}>
                    Yes, announce and send the e-mails
                  </Button>
                  <Button variant="secondary" onClick={() => setConfirming(undefined)}>
                    Not yet
                  </Button>
                </div>
              ) : (
                <Button
                  variant={next.to === 'draft' ? 'secondary' : 'primary'}
                  disabled={!next.allowed || move.isPending}
                  aria-describedby={next.allowed ? undefined : `why-not-${next.to}`}
                  onClick={() => (next.to === 'announced' ? setConfirming(next.to) : go(next.to))}
                >
                  {moveNames[next.to]}
                </Button>
              )}
              {next.allowed ? null : (
                <div id={`why-not-${next.to}`} className="text-vat-950">
                  <p className="font-bold">Not yet, because:</p>
                  <ul className="list-disc pl-6">
                    {next.reasons.map((reason) => (
                      <li key={reason}>{reason}</li>
                    ))}
                  </ul>
                </div>
              )}
            </li>
          ))}
        </ul>
      ) : (
        <p className="text-vat-800">Only the studio’s hosts move a dye-along on.</p>
      )}
    </div>
  );
}

function MailCounts({ mail, announced }: { mail: DyeAlongDetail['mail']; announced: boolean }) {
  const total = mail.queued + mail.sent + mail.skipped + mail.failed;
  if (!announced && total === 0) return null;
  return (
    <div role="status" className="rounded-xl border-2 border-vat-200 bg-vat-100 p-3">
      <p className="font-bold">E-mails to followers</p>
      <p>
        {mail.sent} sent · {mail.queued} waiting · {mail.skipped} not sent
        {mail.failed > 0 ? ` · ${mail.failed} failed` : ''}
      </p>
      <p className="text-sm text-vat-800">
        Waiting includes the reminders that go out the day before. Not sent: the follower stopped
        e-mails, or the dye-along went back to draft.
      </p>
    </div>
  );
}
