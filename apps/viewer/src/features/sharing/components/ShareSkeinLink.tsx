import type { PublicDyeAlong } from '@vatside/contracts/dye-alongs';
import { buttonClass } from '@vatside/ui/Button';
import { Card } from '@vatside/ui/Card';
import { textLinkClass } from '@vatside/ui/link-class.ts';
import { Link } from 'react-router-dom';
import { shareWindowOf } from '../window.ts';

/** On a dye-along's page: the way to share a skein while sharing is open, else when it opens. */
export function ShareSkeinLink({
  dyeAlong,
  timeZone,
  member,
}: {
  dyeAlong: PublicDyeAlong;
  /** The reader's, as on the rest of the page. */
  timeZone: string;
  /** Signed in and following: My skeins is theirs to open. */
  member: boolean;
}) {
  const sharing = shareWindowOf(dyeAlong, { timeZone });
  const slug = dyeAlong.studio.slug;
  return (
    <Card as="section" aria-label="Share your skein" className="space-y-3">
      <p className="text-lg font-bold">{sharing.words}</p>
      {sharing.open ? (
        <Link
          to={`/s/${slug}/dye-alongs/${dyeAlong.id}/share`}
          className={buttonClass('primary', 'hand')}
        >
          Share your skein
        </Link>
      ) : null}
      {member ? (
        <Link to={`/s/${slug}/my-skeins`} className={textLinkClass}>
          My skeins
        </Link>
      ) : null}
    </Card>
  );
}
