import { Button } from '@vatside/ui/Button';
import { FieldFrame, fieldInputClass } from '@vatside/ui/form/FieldFrame';
import { FormAlert } from '@vatside/ui/form/FormAlert';
import { useRef, useState } from 'react';
import { useUploadInspiration } from '../api.ts';

/** One image at a time through the server's pipeline; its palette comes back with it. */
export function UploadInspiration({ slug }: { slug: string }) {
  const [progress, setProgress] = useState<number>();
  const [file, setFile] = useState<File>();
  const inputRef = useRef<HTMLInputElement>(null);
  const upload = useUploadInspiration(slug, setProgress);

  return (
    <form
      aria-label="Upload an inspiration image"
      className="space-y-3"
      onSubmit={(event) => {
        event.preventDefault();
        if (!file) return;
        setProgress(0);
        upload.mutate(file, {
          onSuccess: () => {
            setFile(undefined);
            if (inputRef.current) inputRef.current.value = '';
          },
          onSettled: () => setProgress(undefined),
        });
      }}
    >
      {upload.error ? <FormAlert>{upload.error.message}</FormAlert> : null}
      <FieldFrame
        label="Image file"
        hint="A JPEG, PNG or WebP photo. Location and camera details are removed on upload."
      >
        {(control) => (
          <input
            ref={inputRef}
            type="file"
            accept="image/jpeg,image/png,image/webp"
            className={`${fieldInputClass} py-2`}
            onChange={(event) => setFile(event.target.files?.[0])}
            {...control}
          />
        )}
      </FieldFrame>
      <div className="flex flex-wrap items-center gap-3">
        <Button type="submit" disabled={!file || upload.isPending}>
          {upload.isPending ? 'Uploading…' : 'Upload and find its palette'}
        </Button>
        {progress !== undefined ? (
          <label className="flex items-center gap-2">
            <span>Sent</span>
            <progress max={1} value={progress} className="h-3 w-40 accent-vat-700" />
            <span>{Math.round(progress * 100)} %</span>
          </label>
        ) : null}
      </div>
    </form>
  );
}
