import type { Submission } from '@vatside/contracts/submissions';
import { fiberContentOf, fiberRowsOf, type FiberRow } from './components/FiberRows.tsx';

// What the sharer types about the skein, as it sits in the form (strings) and as it is sent.

export interface DetailsDraft {
  colorwayId: string;
  baseName: string;
  fibers: FiberRow[];
  /** Comma- or line-separated. */
  dyes: string;
  notes: string;
}

export const emptyDraft: DetailsDraft = {
  colorwayId: '',
  baseName: '',
  fibers: [{ fiber: '', pct: '100' }],
  dyes: '',
  notes: '',
};

export const draftOf = (skein: Submission): DetailsDraft => ({
  colorwayId: skein.colorway?.id ?? '',
  baseName: skein.baseName,
  fibers: fiberRowsOf(skein.fiberContent),
  dyes: skein.dyesUsed.join(', '),
  notes: skein.notes,
});

export type DetailErrors = Partial<
  Record<'baseName' | 'fiberContent' | 'dyesUsed' | 'notes', string>
>;

const splitDyes = (text: string) =>
  text
    .split(/[,\n]/)
    .map((d) => d.trim())
    .filter(Boolean);

/** The details as the contract wants them, or a message for each field that is not right. */
export function detailsOf(draft: DetailsDraft) {
  const errors: DetailErrors = {};
  const baseName = draft.baseName.trim();
  if (!baseName) errors.baseName = 'Name the yarn base, e.g. “merino sock”.';
  else if (baseName.length > 120) errors.baseName = 'Keep the base to 120 characters.';
  const fibers = fiberContentOf(draft.fibers);
  if (!fibers.ok) errors.fiberContent = fibers.error;
  const dyesUsed = splitDyes(draft.dyes);
  if (dyesUsed.length > 20) errors.dyesUsed = 'List up to 20 dyes.';
  else if (dyesUsed.some((d) => d.length > 80)) errors.dyesUsed = 'Keep each dye to 80 characters.';
  else if (new Set(dyesUsed.map((d) => d.toLowerCase())).size !== dyesUsed.length)
    errors.dyesUsed = 'List each dye once.';
  const notes = draft.notes.trim();
  if (notes.length > 2_000) errors.notes = 'Keep the notes to 2,000 characters.';
  return {
    errors,
    value: {
      colorwayId: draft.colorwayId || null,
      baseName,
      fiberContent: fibers.ok ? fibers.value : [],
      dyesUsed,
      notes,
    },
  };
}
