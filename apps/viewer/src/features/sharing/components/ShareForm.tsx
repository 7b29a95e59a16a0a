import { MAX_SHARE_PHOTOS, type Submission, type YarnCrop } from '@vatside/contracts/submissions';
import { ApiError } from '@vatside/ui/api-client.ts';
import { Button } from '@vatside/ui/Button';
import { FormAlert } from '@vatside/ui/form/FormAlert';
import { useEffect, useRef, useState, type FormEvent } from 'react';
import { useShareSkein } from '../api.ts';
import { MIDDLE_AREA, tidyCrop } from '../crop.ts';
import { detailsOf, emptyDraft, type DetailErrors, type DetailsDraft } from '../details.ts';
import { ConsentSwitch } from './ConsentSwitch.tsx';
import { DetailsFields } from './DetailsFields.tsx';
import { PhotoPicker, type PickedPhoto } from './PhotoPicker.tsx';
import { UploadProgress } from './UploadProgress.tsx';

/** The server's largest photo (UPLOAD_MAX_BYTES); checked here first to save a slow upload. */
const MAX_PHOTO_BYTES = 20 * 1024 * 1024;

type Errors = DetailErrors & {
  colorwayId?: string;
  photos?: string;
  photoAt: Record<number, string>;
};
const noErrors: Errors = { photoAt: {} };

/** Server field names ("baseName", "photos.1", …) put beside their fields. */
function errorsFromServer(error: unknown): Errors {
  const out: Errors = { photoAt: {} };
  if (!(error instanceof ApiError) || !error.fields) return out;
  for (const [key, messages] of Object.entries(error.fields)) {
    const text = messages.join(' ');
    const photo = /^photos\.(\d+)$/.exec(key);
    if (photo) out.photoAt[Number(photo[1])] = text;
    else if (key === 'photos' || key.startsWith('crops')) out.photos = text;
    else if (key.startsWith('fiberContent')) out.fiberContent = text;
    else if (key.startsWith('dyesUsed')) out.dyesUsed = text;
    else if (key === 'baseName' || key === 'notes' || key === 'colorwayId') out[key] = text;
  }
  return out;
}

let photoSerial = 0;

/**
 * The share: photos with their yarn areas, the details, consent (off by default), sent as one
 * upload with a progress bar. On a refusal everything stays as typed and picked.
 */
export function ShareForm({
  slug,
  dyeAlongId,
  colorways,
  onShared,
}: {
  slug: string;
  dyeAlongId: string;
  colorways: { colorwayId: string; name: string }[];
  onShared: (skein: Submission) => void;
}) {
  const [photos, setPhotos] = useState<PickedPhoto[]>([]);
  const [draft, setDraft] = useState<DetailsDraft>(emptyDraft);
  const [consent, setConsent] = useState(false);
  const [errors, setErrors] = useState<Errors>(noErrors);
  const [progress, setProgress] = useState(0);
  const share = useShareSkein(slug, dyeAlongId);
  const alertRef = useRef<HTMLDivElement>(null);

  // Object URLs live as long as the form; the last ones go when it closes.
  const urls = useRef(new Set<string>());
  useEffect(() => {
    const held = urls.current;
    return () => held.forEach((u) => URL.revokeObjectURL(u));
  }, []);

  function add(files: File[]) {
    const room = MAX_SHARE_PHOTOS - photos.length;
    const tooBig = files.filter((f) => f.size > MAX_PHOTO_BYTES);
    const fitting = files.filter((f) => f.size <= MAX_PHOTO_BYTES).slice(0, room);
    const added = fitting.map((file) => {
      const url = URL.createObjectURL(file);
      urls.current.add(url);
      return { key: `photo-${++photoSerial}`, file, url, crop: MIDDLE_AREA };
    });
    setPhotos([...photos, ...added]);
    const problems = [
      tooBig.length
        ? `${tooBig.length === 1 ? 'A photo is' : 'Some photos are'} over 20 MB; pick a smaller one.`
        : '',
      files.length - tooBig.length > room
        ? `Only ${MAX_SHARE_PHOTOS} photos fit in one share.`
        : '',
    ].filter(Boolean);
    setErrors({ ...errors, photos: problems.join(' ') || undefined, photoAt: {} });
  }

  function remove(key: string) {
    const gone = photos.find((p) => p.key === key);
    if (gone) {
      URL.revokeObjectURL(gone.url);
      urls.current.delete(gone.url);
    }
    setPhotos(photos.filter((p) => p.key !== key));
    setErrors({ ...errors, photoAt: {} });
  }

  const setCrop = (key: string, crop: YarnCrop) =>
    setPhotos(photos.map((p) => (p.key === key ? { ...p, crop } : p)));

  function submit(event: FormEvent) {
    event.preventDefault();
    const { errors: detailErrors, value } = detailsOf(draft);
    const found: Errors = { ...detailErrors, photoAt: {} };
    if (photos.length === 0) found.photos = 'Add at least one photo of the skein.';
    const hasErrors = Object.keys(detailErrors).length > 0 || found.photos;
    setErrors(found);
    if (hasErrors) {
      requestAnimationFrame(() => alertRef.current?.focus());
      return;
    }
    setProgress(0);
    share.mutate(
      {
        photos: photos.map((p) => p.file),
        details: {
          ...value,
          consentToFeature: consent,
          crops: photos.map((p) => tidyCrop(p.crop)),
        },
        onProgress: setProgress,
      },
      {
        onSuccess: onShared,
        onError: (error) => {
          setErrors(errorsFromServer(error));
          requestAnimationFrame(() => alertRef.current?.focus());
        },
      },
    );
  }

  const problemCount =
    Object.entries(errors).filter(([k, v]) => k !== 'photoAt' && v).length +
    Object.keys(errors.photoAt).length;

  return (
    <form noValidate onSubmit={submit} className="space-y-8" aria-busy={share.isPending}>
      <div ref={alertRef} tabIndex={-1} className="outline-none">
        {share.error ? (
          <FormAlert>
            {share.error.message}
            {share.error instanceof ApiError && share.error.status === 429
              ? null
              : ' Nothing you added is lost.'}
          </FormAlert>
        ) : problemCount > 0 ? (
          <FormAlert>
            {problemCount === 1 ? 'One thing needs a look' : `${problemCount} things need a look`}{' '}
            before sharing; each is marked below.
          </FormAlert>
        ) : null}
      </div>
      <PhotoPicker
        photos={photos}
        onAdd={add}
        onRemove={remove}
        onCrop={setCrop}
        error={errors.photos}
        photoErrors={errors.photoAt}
      />
      <section aria-labelledby="share-details-title" className="space-y-4">
        <h2 id="share-details-title" className="font-display text-2xl font-semibold">
          About the skein
        </h2>
        <DetailsFields draft={draft} onChange={setDraft} errors={errors} colorways={colorways} />
      </section>
      <section aria-labelledby="share-consent-title" className="space-y-3">
        <h2 id="share-consent-title" className="font-display text-2xl font-semibold">
          The recap
        </h2>
        <ConsentSwitch checked={consent} onChange={setConsent} />
      </section>
      {share.isPending ? <UploadProgress fraction={progress} /> : null}
      <Button type="submit" size="hand" disabled={share.isPending}>
        {share.isPending ? 'Sharing…' : 'Share my skein'}
      </Button>
    </form>
  );
}
