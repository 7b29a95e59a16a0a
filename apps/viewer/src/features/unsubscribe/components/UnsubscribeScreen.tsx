import { useQuery } from '@tanstack/react-query';
import { Button } from '@vatside/ui/Button';
import { Card } from '@vatside/ui/Card';
import { ErrorPanel } from '@vatside/ui/ErrorPanel';
import { FormAlert } from '@vatside/ui/form/FormAlert';
import { textLinkClass } from '@vatside/ui/link-class.ts';
import { LoadingBlock } from '@vatside/ui/LoadingBlock';
import { useEffect, useRef } from 'react';
import { Link } from 'react-router-dom';
import { unsubscribeQueryOptions, useUnsubscribe } from '../api.ts';

/** From an e-mail's link: say which studio, stop its e-mails with one press, then confirm. */
export function UnsubscribeScreen({ token }: { token: string }) {
  const about = useQuery(unsubscribeQueryOptions(token));
  const stop = useUnsubscribe(token);
  const doneRef = useRef<HTMLHeadingElement>(null);
  useEffect(() => {
    if (stop.isSuccess) doneRef.current?.focus();
  }, [stop.isSuccess]);

  if (about.isPending) return <LoadingBlock label="Reading the link…" />;
  if (about.isError) {
    return (
      <ErrorPanel
        title="This link did not work"
        error={about.error}
        onRetry={() => void about.refetch()}
        retrying={about.isFetching}
        retrySize="hand"
      />
    );
  }
  const { studio, mailOptIn } = about.data;
  const studioLink = (
    <Link to={`/s/${studio.slug}`} className={textLinkClass}>
      Go to {studio.name}
    </Link>
  );

  if (!mailOptIn) {
    return (
      <Card as="section" aria-labelledby="unsubscribe-done" className="space-y-4">
        <h1
          id="unsubscribe-done"
          ref={doneRef}
          tabIndex={-1}
          className="font-display text-3xl font-semibold"
        >
          {stop.isSuccess ? (
            <>
              Done: no more <span className="whitespace-nowrap">e-mails</span>
            </>
          ) : (
            'You are already off the list'
          )}
        </h1>
        <p className="text-lg">
          {studio.name} will not e-mail you about dye-alongs. To hear from the studio again, turn
          e-mails back on from its page.
        </p>
        {studioLink}
      </Card>
    );
  }
  return (
    <Card as="section" aria-labelledby="unsubscribe-title" className="space-y-4">
      <h1 id="unsubscribe-title" className="font-display text-3xl font-semibold">
        Stop <span className="whitespace-nowrap">e-mails</span> from {studio.name}?
      </h1>
      <p className="text-lg">
        No more dye-along announcements or day-before reminders from this studio. Its page stays
        open to you.
      </p>
      {stop.error ? <FormAlert>{stop.error.message}</FormAlert> : null}
      <Button size="hand" onClick={() => stop.mutate()} disabled={stop.isPending}>
        {stop.isPending ? 'Stopping…' : 'Stop these e-mails'}
      </Button>
      {studioLink}
    </Card>
  );
}
