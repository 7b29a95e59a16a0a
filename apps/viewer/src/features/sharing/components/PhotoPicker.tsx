import { MAX_SHARE_PHOTOS, PHOTO_TIPS, type YarnCrop } from '@vatside/contracts/submissions';
import { Button, buttonClass } from '@vatside/ui/Button';
import { useId, useRef } from 'react';
import { YarnAreaEditor } from './YarnAreaEditor.tsx';

export interface PickedPhoto {
  key: string;
  file: File;
  /** An object URL for the preview; revoked when the photo is taken out. */
  url: string;
  crop: YarnCrop;
}

/**
 * One to four photos from the camera or the library, each with its yarn area marked. The
 * lighting tips sit beside the camera button, where the photo is taken.
 */
export function PhotoPicker({
  photos,
  onAdd,
  onRemove,
  onCrop,
  error,
  photoErrors,
}: {
  photos: PickedPhoto[];
  onAdd: (files: File[]) => void;
  onRemove: (key: string) => void;
  onCrop: (key: string, crop: YarnCrop) => void;
  error?: string | undefined;
  photoErrors: Record<number, string>;
}) {
  const id = useId();
  const camera = useRef<HTMLInputElement>(null);
  const library = useRef<HTMLInputElement>(null);
  const room = MAX_SHARE_PHOTOS - photos.length;
  const take = (input: HTMLInputElement) => {
    onAdd([...(input.files ?? [])]);
    input.value = '';
  };

  return (
    <fieldset className="space-y-4" aria-describedby={`${id}-tips`}>
      <legend className="font-display text-2xl font-semibold">Photos</legend>
      <p className="text-vat-800">
        One to {MAX_SHARE_PHOTOS} photos of the skein.{' '}
        {photos.length > 0 ? `${photos.length} added.` : ''}
      </p>
      {room > 0 ? (
        <div className="grid gap-3 sm:grid-cols-2">
          <label htmlFor={`${id}-camera`} className={buttonClass('primary', 'hand')}>
            Take a photo
          </label>
          <input
            id={`${id}-camera`}
            ref={camera}
            type="file"
            accept="image/*"
            capture="environment"
            className="sr-only"
            onChange={(e) => take(e.currentTarget)}
          />
          <label htmlFor={`${id}-library`} className={buttonClass('secondary', 'hand')}>
            Choose from photos
          </label>
          <input
            id={`${id}-library`}
            ref={library}
            type="file"
            accept="image/jpeg,image/png,image/webp,image/*"
            multiple
            className="sr-only"
            onChange={(e) => take(e.currentTarget)}
          />
        </div>
      ) : (
        <p className="font-bold">That is {MAX_SHARE_PHOTOS} photos, the most one share holds.</p>
      )}
      <div
        id={`${id}-tips`}
        className="rounded-xl border-2 border-marigold-300 bg-marigold-100 p-4"
      >
        <p className="font-bold">For true colors</p>
        <ul className="list-disc pl-5">
          {PHOTO_TIPS.map((tip) => (
            <li key={tip}>{tip}</li>
          ))}
        </ul>
      </div>
      {error ? (
        <p role="alert" className="flex items-center gap-1.5 font-bold text-madder-700">
          <span aria-hidden="true">✕</span>
          {error}
        </p>
      ) : null}
      {photos.length > 0 ? (
        <p className="text-vat-800">
          Put the box over the yarn on each photo: drag it or its round corners, or use the buttons.
          Only the yarn inside the box is compared with the inspiration.
        </p>
      ) : null}
      <ol className="space-y-6">
        {photos.map((photo, i) => (
          <li key={photo.key} className="space-y-2 rounded-xl border border-wool-200 bg-white p-3">
            <div className="flex items-center justify-between gap-3">
              <p className="font-bold">Photo {i + 1}</p>
              <Button variant="secondary" onClick={() => onRemove(photo.key)}>
                Take out photo {i + 1}
              </Button>
            </div>
            {photoErrors[i] ? (
              <p className="flex items-center gap-1.5 font-bold text-madder-700">
                <span aria-hidden="true">✕</span>
                {photoErrors[i]}
              </p>
            ) : null}
            <YarnAreaEditor
              src={photo.url}
              label={`Photo ${i + 1}`}
              crop={photo.crop}
              onChange={(crop) => onCrop(photo.key, crop)}
            />
          </li>
        ))}
      </ol>
    </fieldset>
  );
}
