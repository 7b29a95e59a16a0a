import type { Image } from '@vatside/contracts/workbench-images';
import { Button } from '@vatside/ui/Button';
import { FormAlert } from '@vatside/ui/form/FormAlert';
import { useState, type MouseEvent } from 'react';
import { TwoPressButton } from '../../../components/TwoPressButton.tsx';
import { formatMoment } from '../../../lib/format.ts';
import { useDeleteImage, usePickSwatch } from '../api.ts';
import { PaletteEditor } from './PaletteEditor.tsx';

/** One inspiration image with its palette; in picking mode a click adds the color under it. */
export function InspirationImage({
  slug,
  image,
  number,
  canEdit,
}: {
  slug: string;
  image: Image;
  number: number;
  canEdit: boolean;
}) {
  const [picking, setPicking] = useState(false);
  const pick = usePickSwatch(slug, image.id);
  const remove = useDeleteImage(slug);
  const title = `Inspiration image ${number}`;

  const onPick = (event: MouseEvent<HTMLImageElement>) => {
    const box = event.currentTarget.getBoundingClientRect();
    if (box.width === 0 || box.height === 0) return;
    const clamp = (v: number) => Math.min(1, Math.max(0, v));
    pick.mutate(
      {
        x: clamp((event.clientX - box.left) / box.width),
        y: clamp((event.clientY - box.top) / box.height),
      },
      { onSuccess: () => setPicking(false) },
    );
  };

  return (
    <article aria-label={title} className="grid gap-5 lg:grid-cols-[minmax(0,1fr)_minmax(0,1fr)]">
      <div className="space-y-3 self-start lg:sticky lg:top-4">
        <h3 className="text-xl font-bold">{title}</h3>
        <img
          src={image.webUrl}
          width={image.width}
          height={image.height}
          alt={`${title}, uploaded ${formatMoment(image.createdAt)}`}
          onClick={picking ? onPick : undefined}
          className={`h-auto w-full rounded-card border-2 ${picking ? 'cursor-crosshair border-marigold-500 outline-4 outline-marigold-300' : 'border-wool-300'}`}
        />
        {pick.error ? <FormAlert>{pick.error.message}</FormAlert> : null}
        {canEdit ? (
          <div className="flex flex-wrap gap-2">
            <Button
              variant={picking ? 'primary' : 'secondary'}
              aria-pressed={picking}
              onClick={() => setPicking(!picking)}
              disabled={pick.isPending}
            >
              {pick.isPending
                ? 'Adding the color…'
                : picking
                  ? 'Now tap a point on the image'
                  : 'Add a swatch from a point'}
            </Button>
            <TwoPressButton
              label={`Delete ${title}`}
              confirm="Yes, delete"
              busy={remove.isPending}
              onConfirm={() => remove.mutate(image.id)}
            />
          </div>
        ) : null}
        {remove.error ? <FormAlert>{remove.error.message}</FormAlert> : null}
      </div>
      <div className="min-w-0 space-y-2">
        <h4 className="font-bold">Palette</h4>
        <PaletteEditor
          key={image.palette
            .map((s) => s.id)
            .sort()
            .join()}
          slug={slug}
          image={image}
          canEdit={canEdit}
        />
      </div>
    </article>
  );
}
