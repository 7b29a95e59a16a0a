import { useQuery } from '@tanstack/react-query';
import { useParams } from 'react-router-dom';
import { DyeAlongPage } from '../../features/dye-alongs/components/DyeAlongPage.tsx';
import { GalleryLink } from '../../features/gallery/components/GalleryLink.tsx';
import { LiveNowLink } from '../../features/live/components/LiveNowLink.tsx';
import { ShareSkeinLink } from '../../features/sharing/components/ShareSkeinLink.tsx';
import { studioQueryOptions } from '../../features/studios/api.ts';
import { FollowPanel } from '../../features/studios/components/FollowPanel.tsx';

/**
 * /s/:slug/dye-alongs/:dyeAlongId: a dye-along's page, with the way onto the stove, sharing a
 * skein, and follow.
 */
export function Component() {
  const { slug = '', dyeAlongId = '' } = useParams();
  const { data: studio } = useQuery(studioQueryOptions(slug));
  return (
    <div className="space-y-6">
      <LiveNowLink slug={slug} />
      <DyeAlongPage
        slug={slug}
        dyeAlongId={dyeAlongId}
        sharing={(dyeAlong, timeZone) => (
          <ShareSkeinLink
            dyeAlong={dyeAlong}
            timeZone={timeZone}
            member={studio !== undefined && studio.myRole !== 'visitor'}
          />
        )}
      />
      <GalleryLink slug={slug} dyeAlongId={dyeAlongId} />
      {studio ? <FollowPanel studio={studio} /> : null}
    </div>
  );
}
