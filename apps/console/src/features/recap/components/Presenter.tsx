import type { Recap } from '@vatside/contracts/gallery';
import { Swatch } from '@vatside/ui/Swatch';
import { useCallback, useEffect, useRef, useState } from 'react';
import { useOfflinePhotos } from '../hooks/use-offline-photos.ts';
import { usePresenterChannel } from '../hooks/use-presenter-channel.ts';
import { slideOf, slidePhoto, slideTitle, type Slide } from '../slides.ts';

// What presentation clickers send: arrows, PageUp/PageDown, and Space (Shift+Space goes back).
const NEXT_KEYS = new Set(['ArrowRight', 'ArrowDown', 'PageDown', ' ']);
const BACK_KEYS = new Set(['ArrowLeft', 'ArrowUp', 'PageUp']);

/**
 * The recap, full screen, one item at a time, for recording. The notes live in a window of
 * their own (kept in step), or show here only while the host turns them on (N), so a recording
 * of this screen never carries them by accident.
 */
export function Presenter({
  recap,
  leaveTo,
  notesPath,
}: {
  recap: Recap;
  leaveTo: string;
  notesPath: string;
}) {
  const slides = recap.items.map(slideOf);
  const photos = useOfflinePhotos(
    slides.flatMap((s) => {
      const photo = slidePhoto(s);
      return photo ? [photo.url] : [];
    }),
  );
  const [index, setIndex] = useState(0);
  const [showNote, setShowNote] = useState(false);
  const stage = useRef<HTMLDivElement>(null);
  const last = slides.length - 1;
  const go = useCallback((to: number) => setIndex(Math.max(0, Math.min(last, to))), [last]);
  const send = usePresenterChannel(recap.dyeAlongId, (message) => {
    if (message.type === 'go') go(message.index);
    if (message.type === 'hello') send({ type: 'at', index });
  });
  useEffect(() => send({ type: 'at', index }), [send, index]);

  const toggleFullscreen = useCallback(() => {
    if (document.fullscreenElement) void document.exitFullscreen();
    else void stage.current?.requestFullscreen?.().catch(() => undefined);
  }, []);

  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      if (e.altKey || e.ctrlKey || e.metaKey) return;
      // Space on a focused button presses it; everything else steps the slides.
      if (e.key === ' ' && e.target instanceof HTMLButtonElement) return;
      if (e.key === ' ' && e.shiftKey) go(index - 1);
      else if (NEXT_KEYS.has(e.key)) go(index + 1);
      else if (BACK_KEYS.has(e.key)) go(index - 1);
      else if (e.key === 'Home') go(0);
      else if (e.key === 'End') go(last);
      else if (e.key === 'f' || e.key === 'F') toggleFullscreen();
      else if (e.key === 'n' || e.key === 'N') setShowNote((on) => !on);
      else return;
      e.preventDefault();
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [go, index, last, toggleFullscreen]);

  const slide = slides[Math.min(index, last)];
  return (
    <div
      ref={stage}
      className="flex min-h-dvh flex-col bg-vat-950 text-wool-50 [--vs-focus:var(--color-marigold-300)]"
    >
      <header className="flex flex-wrap items-center gap-x-6 gap-y-2 px-6 py-3">
        <a href={leaveTo} className="min-h-12 content-center font-bold underline">
          ← Running order
        </a>
        <p
          aria-live="polite"
          className={photos.ready ? 'font-bold text-marigold-300' : 'font-bold'}
        >
          {photos.total === 0
            ? 'No photos to hold'
            : photos.ready
              ? 'Ready to record offline'
              : `Holding photos for offline: ${photos.done} / ${photos.total}`}
          {photos.failed > 0 ? ` (${photos.failed} did not load)` : ''}
        </p>
        <a
          href={notesPath}
          target="vatside-recap-notes"
          className="min-h-12 content-center font-bold underline"
        >
          Open the notes window
        </a>
        <p className="ml-auto text-wool-200">
          ←/→, PageUp/PageDown, Space · Home/End · F full screen · N note
        </p>
      </header>
      {slide ? (
        <>
          <main className="flex min-h-0 flex-1 flex-col items-center gap-6 px-6 pb-4 lg:flex-row lg:items-stretch">
            <SlidePhoto slide={slide} src={photos.src} />
            <SlideFacts slide={slide} />
          </main>
          {showNote ? (
            <aside
              aria-label="Your note"
              className="mx-6 mb-3 rounded-xl bg-marigold-300 p-4 text-xl text-vat-950"
            >
              <span className="font-bold">Say: </span>
              {slide.note || 'No note for this item.'}
            </aside>
          ) : null}
          <footer className="flex items-center gap-4 px-6 pb-4">
            <p
              role="status"
              aria-label={`Item ${index + 1} of ${slides.length}`}
              className="font-display text-3xl font-semibold tabular-nums"
            >
              {index + 1} / {slides.length}
            </p>
            <div aria-hidden="true" className="h-3 flex-1 overflow-hidden rounded-full bg-vat-800">
              <div
                className="h-full rounded-full bg-marigold-300 transition-[width]"
                style={{ width: `${((index + 1) / slides.length) * 100}%` }}
              />
            </div>
            <button
              type="button"
              onClick={() => go(index - 1)}
              disabled={index === 0}
              className="min-h-12 rounded-xl border-2 border-wool-50 px-4 font-bold disabled:opacity-40"
            >
              Back
            </button>
            <button
              type="button"
              onClick={() => go(index + 1)}
              disabled={index === last}
              className="min-h-12 rounded-xl border-2 border-wool-50 px-4 font-bold disabled:opacity-40"
            >
              Next
            </button>
            <button
              type="button"
              onClick={toggleFullscreen}
              className="min-h-12 rounded-xl border-2 border-wool-50 px-4 font-bold"
            >
              Full screen
            </button>
          </footer>
        </>
      ) : (
        <main className="flex flex-1 items-center justify-center p-6 text-2xl">
          The running order is empty. Add skeins and colorways first.
        </main>
      )}
    </div>
  );
}

function SlidePhoto({ slide, src }: { slide: Slide; src: (url: string) => string }) {
  const photo = slidePhoto(slide);
  if (!photo) {
    return (
      <div className="flex min-h-64 flex-1 items-center justify-center rounded-2xl bg-vat-900 p-6 text-xl">
        No photo
      </div>
    );
  }
  return (
    <div className="flex min-h-0 flex-1 items-center justify-center">
      <img
        key={photo.url}
        src={src(photo.url)}
        width={photo.width}
        height={photo.height}
        alt={slideTitle(slide)}
        className="h-auto max-h-[72dvh] w-full rounded-2xl object-contain"
      />
    </div>
  );
}

function SlideFacts({ slide }: { slide: Slide }) {
  if (slide.kind === 'skein') {
    const { skein } = slide;
    return (
      <section aria-label="Shown now" className="w-full space-y-3 lg:w-96 lg:shrink-0">
        <p className="text-xl text-marigold-300">{skein.colorway?.name ?? 'Own colors'}</p>
        <h1 className="font-display text-5xl leading-tight font-semibold">{skein.makerName}</h1>
        <p className="text-2xl">{skein.baseName}</p>
        {skein.dyesUsed.length ? (
          <p className="text-xl">
            <span className="font-bold">Dyes: </span>
            {skein.dyesUsed.join(', ')}
          </p>
        ) : null}
      </section>
    );
  }
  const { colorway } = slide;
  return (
    <section aria-label="Shown now" className="w-full space-y-3 lg:w-96 lg:shrink-0">
      <p className="text-xl text-marigold-300">From the studio</p>
      <h1 className="font-display text-5xl leading-tight font-semibold">{colorway.name}</h1>
      <ul aria-label={`Colors of ${colorway.name}`} className="space-y-2 text-xl">
        {colorway.swatches.map((s) => (
          <li key={`${s.hex}-${s.name}`}>
            <Swatch hex={s.hex} label={s.name} />
          </li>
        ))}
      </ul>
    </section>
  );
}
