import type { StudioRole } from '@vatside/contracts/roles';

export const roleNames: Record<StudioRole, string> = {
  host: 'Host',
  moderator: 'Moderator',
  viewer: 'Viewer',
};
