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
  // The dye log is the host's record; helpers read it. Helpers and the host run the questions.
  'live:log': ['host'],
  'live:logRead': ['moderator', 'host'],
  'live:moderate': ['moderator', 'host'],
  // Sharing: members share skeins and manage only their own; visitors see the public gallery.
  'submission:share': ['viewer', 'moderator', 'host'],
  // Review: helpers and the host work the queue and read the audit.
  'review:work': ['moderator', 'host'],
  // The recap running order: helpers read it, the host builds it.
  'recap:read': ['moderator', 'host'],
  'recap:edit': ['host'],
  // What the studio keeps in the object store, and who shares the most: the host's to see.
  'storage:read': ['host'],
  // The archive (bath records, what went into each pot, dye again against the shelf) is the
  // studio's production record: helpers read it, the host writes the bath records.
  'archive:read': ['moderator', 'host'],
  'archive:edit': ['host'],
} as const satisfies Record<string, readonly StudioStanding[]>;

export type StudioAction = keyof typeof studioPolicy;

export function can(standing: StudioStanding, action: StudioAction): boolean {
  return (studioPolicy[action] as readonly StudioStanding[]).includes(standing);
}
