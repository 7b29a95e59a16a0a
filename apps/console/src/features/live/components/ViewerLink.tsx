import { Button } from '@vatside/ui/Button';
import { useEffect, useRef, useState } from 'react';
import { QrCode } from './QrCode.tsx';

/** The follow-along link for the stream's description, with a QR code for the video overlay. */
export function ViewerLink({ url, rehearsal }: { url: string; rehearsal: boolean }) {
  const [copied, setCopied] = useState<'yes' | 'failed' | null>(null);
  const [large, setLarge] = useState(false);
  const closeRef = useRef<HTMLButtonElement>(null);
  useEffect(() => {
    if (large) closeRef.current?.focus();
  }, [large]);

  async function copy() {
    try {
      await navigator.clipboard.writeText(url);
      setCopied('yes');
    } catch {
      setCopied('failed');
    }
  }

  return (
    <div className="space-y-3">
      {rehearsal ? (
        <p className="font-bold">
          While you rehearse, only you can open this link (signed in, on your own phone).
        </p>
      ) : null}
      <p className="rounded-xl border-2 border-wool-200 bg-white px-3 py-2 font-bold break-all select-all">
        {url}
      </p>
      <div className="flex flex-wrap items-center gap-2">
        <Button onClick={() => void copy()}>Copy the link</Button>
        <Button variant="secondary" onClick={() => setLarge(true)}>
          Show the QR code large
        </Button>
        <span role="status" className="font-bold">
          {copied === 'yes'
            ? '✓ Copied'
            : copied === 'failed'
              ? 'Select the link and copy it.'
              : ''}
        </span>
      </div>
      <QrCode text={url} label="QR code of the follow-along link" className="size-40" />
      {large ? (
        <div
          role="dialog"
          aria-modal="true"
          aria-label="QR code for the stream"
          onKeyDown={(event) => {
            if (event.key === 'Escape') setLarge(false);
          }}
          className="fixed inset-0 z-20 flex flex-col items-center justify-center gap-4 bg-vat-950/90 p-6"
        >
          <QrCode
            text={url}
            label="QR code of the follow-along link, large"
            className="size-[min(70vh,70vw)]"
          />
          <p className="text-center text-2xl font-bold text-wool-50">
            Scan to follow the pots on your phone
          </p>
          <Button
            ref={closeRef}
            size="hand"
            variant="secondary"
            className="max-w-xs"
            onClick={() => setLarge(false)}
          >
            Close
          </Button>
        </div>
      ) : null}
    </div>
  );
}
