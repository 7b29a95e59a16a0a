import type { Submission, YarnCrop } from '@vatside/contracts/submissions';
import { Button } from '@vatside/ui/Button';
import { FormAlert } from '@vatside/ui/form/FormAlert';
import { useState, type FormEvent } from 'react';
import { useUpdateSkein } from '../api.ts';
import { tidyCrop } from '../crop.ts';
import { detailsOf, draftOf, type DetailErrors } from '../details.ts';
import { DetailsFields } from './DetailsFields.tsx';
import { YarnAreaEditor } from './YarnAreaEditor.tsx';

/** Change the details and the yarn areas of a skein still waiting or sent back. */
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

  function submit(event: FormEvent) {
    event.preventDefault();
    const { errors: found, value } = detailsOf(draft);
    setErrors(found);
    if (Object.keys(found).length > 0) return;
    const { colorwayId: _unchanged, ...details } = value;
    const moved = skein.photos.filter((p) => crops[p.id] !== p.yarnCrop);
    update.mutate(
      {
        id: skein.id,
        patch: {
          ...details,
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
      <DetailsFields draft={draft} onChange={setDraft} errors={errors} colorways={[]} />
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
