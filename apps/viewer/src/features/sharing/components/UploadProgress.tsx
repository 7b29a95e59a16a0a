/** How much of the upload has gone; once it all has, the server is looking at the colors. */
export function UploadProgress({ fraction }: { fraction: number }) {
  const percent = Math.round(Math.min(1, Math.max(0, fraction)) * 100);
  const sent = percent >= 100;
  return (
    <div className="space-y-2">
      <div
        role="progressbar"
        aria-label="Uploading the photos"
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={percent}
        aria-valuetext={sent ? 'All sent' : `${percent} percent sent`}
        className="h-5 overflow-hidden rounded-full border-2 border-vat-800 bg-white"
      >
        <div className="h-full bg-vat-700 transition-[width]" style={{ width: `${percent}%` }} />
      </div>
      <p aria-live="polite" className="font-bold">
        {sent ? 'Photos sent. Looking at the colors…' : `Sending the photos: ${percent} %`}
      </p>
    </div>
  );
}
