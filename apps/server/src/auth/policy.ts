import type { StudioStanding } from '@vatside/contracts/roles';

/**
 * Who may do what in a studio: the one table every route and socket event checks against.
 * The apps only hide what a role cannot use; this is the rule.
 */
export const studioPolicy = {
  'studio:read': ['visitor', 'viewer', 'moderator', 'host'],
  'studio:follow': ['visitor', 'viewer', 'moderator', 'host'],
  'members:read': ['moderator', 'host'],
  'members:manage': ['host'],
  'invitations:manage': ['host'],
  // The workbench (dye shelf, bases, pots, colorways, images): helpers read, the host edits.
  'workbench:read': ['moderator', 'host'],
  'workbench:edit': ['host'],
  // Dye-alongs: helpers see drafts and the e-mail counts; the host plans and moves them on.
  // Once announced, the public page is read with 'studio:read'.
  'dyeAlong:read': ['moderator', 'host'],
  'dyeAlong:edit': ['host'],
  // Only the host starts a live session or a rehearsal and drives the pots.
  'live:run': ['host'],
} as const satisfies Record<string, readonly StudioStanding[]>;

export type StudioAction = keyof typeof studioPolicy;

export function can(standing: StudioStanding, action: StudioAction): boolean {
  return (studioPolicy[action] as readonly StudioStanding[]).includes(standing);
}
