import { useQuery } from '@tanstack/react-query';
import { viewerPaths } from '@vatside/contracts/dye-alongs';
import { buttonClass } from '@vatside/ui/Button';
import { Card } from '@vatside/ui/Card';
import { useMe } from '@vatside/ui/session.ts';
import { Link } from 'react-router-dom';
import { useDeviceTimeZone } from '../../../hooks/use-device-time-zone.ts';
import { announcedDyeAlongsQueryOptions } from '../api.ts';
import { clockOf } from '../zoned.ts';

/** On a studio's page: its next announced dye-along, on the reader's clock. Nothing otherwise. */
export function NextDyeAlongLink({ slug }: { slug: string }) {
  const { data: me } = useMe();
  const deviceZone = useDeviceTimeZone();
  const { data } = useQuery(announcedDyeAlongsQueryOptions(slug));
  const next = data?.items.find((d) => Date.parse(d.startsAt) > Date.now()) ?? data?.items[0];
  if (!next) return null;
  const when = clockOf(next.startsAt, me?.profile.timeZone ?? deviceZone);
  return (
    <Card as="section" aria-labelledby="next-dye-along" className="space-y-3">
      <p className="font-bold text-vat-800">Next dye-along</p>
      <h2 id="next-dye-along" className="font-display text-2xl font-semibold">
        {next.title}
      </h2>
      <p className="text-lg">
        {when.day}, {when.time} {when.zone}
      </p>
      <Link to={viewerPaths.dyeAlong(slug, next.id)} className={buttonClass('primary', 'hand')}>
        See what to get ready
      </Link>
    </Card>
  );
}
