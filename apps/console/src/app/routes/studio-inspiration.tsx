import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { AddSection } from '../../components/AddSection.tsx';
import { Pager } from '../../components/Pager.tsx';
import { Panel } from '../../components/Panel.tsx';
import { QueryView } from '../../components/QueryView.tsx';
import { firstPage } from '../../lib/studio-path.ts';
import { inspirationImagesQueryOptions } from '../../features/inspiration/api.ts';
import { InspirationImage } from '../../features/inspiration/components/InspirationImage.tsx';
import { UploadInspiration } from '../../features/inspiration/components/UploadInspiration.tsx';
import { useWorkbench } from './workbench-role.ts';

/** Inspiration images and the palettes Vatside finds in them. */
export function Component() {
  const { slug, canEdit } = useWorkbench();
  const [offset, setOffset] = useState(0);
  const images = useQuery(inspirationImagesQueryOptions(slug, { ...firstPage, offset }));
  return (
    <Panel
      title="Inspiration"
      intro="Each image gets a palette of its main colors. Name them the way you will talk about them on the stream."
    >
      {canEdit ? (
        <AddSection title="Add an image">
          <UploadInspiration slug={slug} />
        </AddSection>
      ) : null}
      <QueryView query={images} loading="Fetching images…" failed="The images could not be loaded">
        {(list) =>
          list.items.length === 0 ? (
            <p className="text-lg">No inspiration images yet.</p>
          ) : (
            <div className="space-y-8 divide-y divide-wool-200">
              {list.items.map((image, i) => (
                <InspirationImage
                  key={image.id}
                  slug={slug}
                  image={image}
                  number={list.page.offset + i + 1}
                  canEdit={canEdit}
                />
              ))}
              <Pager page={list.page} noun="images" onOffset={setOffset} />
            </div>
          )
        }
      </QueryView>
    </Panel>
  );
}
