import type { DyeAlongStatus } from '@vatside/contracts/dye-alongs';

// Which status changes make sense, and why the others do not. Pure, so the detail route can
// show the host the reasons before they press a button.

/** The one forward path; only announced → draft goes back, and only before going live. */
const NEXT: Record<DyeAlongStatus, DyeAlongStatus | null> = {
  draft: 'announced',
  announced: 'live',
  live: 'sharing',
  sharing: 'recap',
  recap: 'archived',
  archived: null,
};
const ORDER: DyeAlongStatus[] = ['draft', 'announced', 'live', 'sharing', 'recap', 'archived'];

/** A host may open the live session this long before the announced start (a product choice). */
export const GO_LIVE_EARLIEST_MIN = 120;

export interface TransitionFacts {
  title: string;
  startsAt: Date;
  colorwayCount: number;
  now: Date;
}

/** Why `from → to` is refused; an empty list means it is allowed. */
export function transitionProblems(
  from: DyeAlongStatus,
  to: DyeAlongStatus,
  facts: TransitionFacts,
): string[] {
  if (from === to) return [`It is already ${to}.`];
  if (from === 'archived') return ['An archived dye-along stays archived.'];
  if (from === 'announced' && to === 'draft') return [];
  if (ORDER.indexOf(to) < ORDER.indexOf(from)) {
    return ORDER.indexOf(from) >= ORDER.indexOf('live')
      ? [`It has gone live, so it cannot go back to ${to}.`]
      : [`From ${from} it can only move on to ${NEXT[from]}.`];
  }
  if (NEXT[from] !== to) {
    return [`A dye-along moves one step at a time: from ${from} it goes to ${NEXT[from]} next.`];
  }
  const problems: string[] = [];
  if (to === 'announced') {
    if (facts.title.trim() === '') problems.push('Give it a title.');
    if (facts.startsAt <= facts.now)
      problems.push('Its start time has passed; set a start in the future.');
    if (facts.colorwayCount < 1) problems.push('Add at least one colorway.');
  }
  if (to === 'live') {
    const earliest = facts.startsAt.getTime() - GO_LIVE_EARLIEST_MIN * 60_000;
    if (facts.now.getTime() < earliest) {
      problems.push(
        `It can go live from ${GO_LIVE_EARLIEST_MIN / 60} hours before its start; rehearse privately until then.`,
      );
    }
  }
  return problems;
}

/** Every status the host might try next from `from`, with the reasons it would be refused. */
export function nextStatuses(from: DyeAlongStatus, facts: TransitionFacts) {
  const candidates: DyeAlongStatus[] = [];
  if (NEXT[from]) candidates.push(NEXT[from]);
  if (from === 'announced') candidates.push('draft');
  return candidates.map((to) => {
    const reasons = transitionProblems(from, to, facts);
    return { to, allowed: reasons.length === 0, reasons };
  });
}

/** Statuses whose public page anyone may read. */
export const isPublic = (status: DyeAlongStatus) => status !== 'draft';

/** From live on, the start and the colorways are history, not plans. */
export const isUnderway = (status: DyeAlongStatus) =>
  ORDER.indexOf(status) >= ORDER.indexOf('live');
