import { useQuery } from '@tanstack/react-query';
import type { Submission, YarnCrop } from '@vatside/contracts/submissions';
import { Button } from '@vatside/ui/Button';
import { FormAlert } from '@vatside/ui/form/FormAlert';
import { useState, type FormEvent } from 'react';
import { sharingDyeAlongQueryOptions, useUpdateSkein } from '../api.ts';
import { tidyCrop } from '../crop.ts';
import { detailsOf, draftOf, type DetailErrors } from '../details.ts';
import { DetailsFields } from './DetailsFields.tsx';
import { YarnAreaEditor } from './YarnAreaEditor.tsx';

/**
 * Change the details, the inspiring colorway and the yarn areas of a skein still waiting or sent
 * back. The colorway choice appears once the month's colorways have loaded.
 */
export function SkeinEditForm({
  slug,
  skein,
  onDone,
}: {
  slug: string;
  skein: Submission;
  onDone: () => void;
}) {
  const [draft, setDraft] = useState(() => draftOf(skein));
  const [crops, setCrops] = useState<Record<string, YarnCrop>>(() =>
    Object.fromEntries(skein.photos.map((p) => [p.id, p.yarnCrop])),
  );
  const [errors, setErrors] = useState<DetailErrors>({});
  const update = useUpdateSkein(slug);
  const month = useQuery(sharingDyeAlongQueryOptions(slug, skein.dyeAlong.id));
  const colorways =
    month.data?.supplyList.colorways.map((c) => ({ colorwayId: c.colorwayId, name: c.name })) ?? [];

  function submit(event: FormEvent) {
    event.preventDefault();
    const { errors: found, value } = detailsOf(draft);
    setErrors(found);
    if (Object.keys(found).length > 0) return;
    // The colorway goes only when it changed, and only once the choice was on the screen.
    const { colorwayId, ...details } = value;
    const recolored = colorways.length > 0 && colorwayId !== (skein.colorway?.id ?? null);
    const moved = skein.photos.filter((p) => crops[p.id] !== p.yarnCrop);
    update.mutate(
      {
        id: skein.id,
        patch: {
          ...details,
          ...(recolored ? { colorwayId } : {}),
          ...(moved.length
            ? { crops: moved.map((p) => ({ photoId: p.id, crop: tidyCrop(crops[p.id]!) })) }
            : {}),
        },
      },
      { onSuccess: onDone },
    );
  }

  return (
    <form noValidate onSubmit={submit} className="space-y-5" aria-label="Change this skein">
      {update.error ? (
        <FormAlert>{update.error.message} Your changes are still here.</FormAlert>
      ) : null}
      {skein.photos.map((photo) => (
        <div key={photo.id} className="space-y-1">
          <p className="font-bold">Yarn area on photo {photo.position}</p>
          <YarnAreaEditor
            src={photo.webUrl}
            label={`Photo ${photo.position}`}
            crop={crops[photo.id] ?? photo.yarnCrop}
            onChange={(crop) => setCrops({ ...crops, [photo.id]: crop })}
          />
        </div>
      ))}
      <DetailsFields draft={draft} onChange={setDraft} errors={errors} colorways={colorways} />
      <div className="grid gap-3 sm:grid-cols-2">
        <Button type="submit" size="hand" disabled={update.isPending}>
          {update.isPending ? 'Saving…' : 'Save changes'}
        </Button>
        <Button variant="secondary" size="hand" onClick={onDone} disabled={update.isPending}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
