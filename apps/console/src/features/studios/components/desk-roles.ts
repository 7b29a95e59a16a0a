import type { Membership } from '@vatside/contracts/account';

/** The console is for the studios a person helps run; following alone does not count. */
export function deskMemberships(memberships: Membership[]) {
  return memberships.filter((m) => m.role === 'host' || m.role === 'moderator');
}
