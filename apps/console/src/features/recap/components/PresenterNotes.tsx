import type { Recap } from '@vatside/contracts/gallery';
import { useEffect, useState } from 'react';
import { usePresenterChannel } from '../hooks/use-presenter-channel.ts';
import { slideOf, slideTitle } from '../slides.ts';

/** The host's private notes, in a window of its own, kept in step with the presenter. */
export function PresenterNotes({ recap }: { recap: Recap }) {
  const slides = recap.items.map(slideOf);
  const [index, setIndex] = useState(0);
  const send = usePresenterChannel(recap.dyeAlongId, (message) => {
    if (message.type === 'at') setIndex(message.index);
  });
  useEffect(() => send({ type: 'hello' }), [send]);
  const slide = slides[index];
  const next = slides[index + 1];
  const go = (to: number) =>
    send({ type: 'go', index: Math.max(0, Math.min(slides.length - 1, to)) });
  return (
    <main className="mx-auto max-w-3xl space-y-6 p-6">
      <p
        role="status"
        aria-label={`Item ${index + 1} of ${slides.length}`}
        className="text-2xl font-bold"
      >
        {slides.length ? `${index + 1} / ${slides.length}` : 'The running order is empty.'}
      </p>
      {slide ? (
        <section aria-label="Your note" className="space-y-2">
          <h1 className="font-display text-3xl font-semibold">{slideTitle(slide)}</h1>
          <p className="text-3xl leading-snug">{slide.note || 'No note for this item.'}</p>
        </section>
      ) : null}
      {next ? <p className="text-lg text-vat-800">Next: {slideTitle(next)}</p> : null}
      <div className="flex gap-3">
        <button
          type="button"
          className="min-h-12 rounded-xl border-2 border-vat-800 px-5 font-bold"
          onClick={() => go(index - 1)}
        >
          Back
        </button>
        <button
          type="button"
          className="min-h-12 rounded-xl border-2 border-vat-800 px-5 font-bold"
          onClick={() => go(index + 1)}
        >
          Next
        </button>
      </div>
    </main>
  );
}
