import type { LiveProgram } from '@vatside/contracts/live-program';
import { buttonClass } from '@vatside/ui/Button';
import { DyeStripes } from '@vatside/ui/DyeStripes';
import { Link } from 'react-router-dom';

/** A slim bar: the mark home, what is on the stove, and the way to the video. */
export function LiveTopBar({ program }: { program: LiveProgram }) {
  const { dyeAlong } = program;
  return (
    <header className="bg-vat-900 text-wool-50 [--vs-focus:var(--color-marigold-300)]">
      <div className="mx-auto flex max-w-6xl items-center gap-3 px-4 py-2">
        <Link
          to={`/s/${dyeAlong.studioSlug}`}
          className="flex min-h-12 min-w-0 flex-1 items-center gap-3 rounded-lg"
        >
          <DyeStripes />
          <div className="min-w-0 leading-tight">
            <span className="block truncate text-sm">{dyeAlong.studioName}</span>{' '}
            <h1 className="block truncate font-display text-xl font-semibold">{dyeAlong.title}</h1>
          </div>
        </Link>
        {dyeAlong.streamUrl ? (
          <a
            href={dyeAlong.streamUrl}
            target="_blank"
            rel="noopener noreferrer"
            className={`${buttonClass('secondary')} shrink-0 px-4`}
          >
            Watch <span className="max-sm:sr-only">the stream</span>{' '}
            <span className="sr-only">(opens in a new tab)</span> <span aria-hidden="true">↗</span>
          </a>
        ) : null}
      </div>
    </header>
  );
}
