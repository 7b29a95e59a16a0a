import { useQuery } from '@tanstack/react-query';
import { buttonClass } from '@vatside/ui/Button';
import { Link } from 'react-router-dom';
import { studioLiveQueryOptions } from '../live-now-api.ts';

/** On a studio's page while a session runs: the way onto the stove. Nothing otherwise. */
export function LiveNowLink({ slug }: { slug: string }) {
  const { data } = useQuery(studioLiveQueryOptions(slug));
  const live = data?.live;
  if (!live) return null;
  return (
    <section
      aria-label="Live now"
      className="space-y-3 rounded-card border-2 border-madder-700 bg-madder-100 p-5"
    >
      <p className="text-lg font-bold text-madder-800">
        <span aria-hidden="true">● </span>Live now
      </p>
      <p className="font-display text-2xl font-semibold">{live.title}</p>
      <Link to={`/live/${live.sessionId}`} className={buttonClass('primary', 'hand')}>
        Follow live
      </Link>
    </section>
  );
}
