import type { DyeAlongStatus } from './dye-alongs.ts';

// When viewers may share a skein for a dye-along. Pure, so the rule is tested on its own and
// the refusal can say plainly why.

export interface SharingFacts {
  status: DyeAlongStatus;
  shareOpensAt: Date | null;
  shareClosesAt: Date | null;
}

export type SharingWindow = { open: true } | { open: false; reason: string };

const day = (d: Date) => d.toISOString().slice(0, 16).replace('T', ' ') + ' UTC';

/**
 * Explicit dates win: before `shareOpensAt` or from `shareClosesAt` on, sharing is closed.
 * Otherwise it is open while the dye-along is in its sharing status, or once `shareOpensAt`
 * has passed (the host may open sharing early, say right after the live session).
 */
export function sharingWindow(facts: SharingFacts, now: Date): SharingWindow {
  if (facts.status === 'draft' || facts.status === 'archived') {
    return { open: false, reason: `Sharing is closed: this dye-along is ${facts.status}.` };
  }
  if (facts.shareClosesAt && now >= facts.shareClosesAt) {
    return { open: false, reason: `Sharing closed on ${day(facts.shareClosesAt)}.` };
  }
  if (facts.shareOpensAt && now < facts.shareOpensAt) {
    return { open: false, reason: `Sharing opens on ${day(facts.shareOpensAt)}.` };
  }
  if (facts.status === 'sharing' || facts.shareOpensAt) return { open: true };
  return {
    open: false,
    reason: 'Sharing is not open yet; the host opens it after the live session.',
  };
}
