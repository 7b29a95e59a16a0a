import type { LiveNote } from '@vatside/contracts/live';
import { formatClockTime } from '../utils/format.ts';

const shownNotes = 3;

/** The host's latest notes, newest first. */
export function HostNotes({ notes }: { notes: readonly LiveNote[] }) {
  const latest = [...notes].sort((a, b) => b.atMs - a.atMs).slice(0, shownNotes);
  return (
    <section aria-label="Notes from the host" aria-live="polite" className="space-y-2">
      {latest.map((note) => (
        <p
          key={note.id}
          className="rounded-xl border-2 border-l-8 border-vat-700 bg-white px-4 py-2 text-lg"
        >
          <span className="block text-sm font-bold text-vat-800">
            Host · {formatClockTime(note.atMs)}
          </span>
          <span className="block">{note.text}</span>
        </p>
      ))}
    </section>
  );
}
