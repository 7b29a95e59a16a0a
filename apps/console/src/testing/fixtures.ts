import type { Me, Profile } from '@vatside/contracts/account';
import type { Health } from '@vatside/contracts/health';
import type { Invitation, Member } from '@vatside/contracts/members';
import type { StudioDetail, StudioList, StudioSummary } from '@vatside/contracts/studios';

// Invented studios; any likeness to a real one is accidental.
export const studioList: StudioList = {
  studios: [
    {
      id: '3f1c2a4e-8b7d-4c2a-9e1f-5a6b7c8d9e01',
      slug: 'kelpwhistle-dyeworks',
      name: 'Kelpwhistle Dyeworks',
      tagline: 'Tide pool colors, dyed along once a month.',
      accentHex: '#2a7f86',
    },
    {
      id: '7a2b9c1d-4e5f-4a6b-8c7d-0e1f2a3b4c5d',
      slug: 'brindlemoor-vats',
      name: 'Brindlemoor Vats',
      tagline: 'Heather, peat and the last drop of every pot.',
      accentHex: '#8c3b5e',
    },
  ],
};

export const healthyReport: Health = {
  status: 'ok',
  version: '0.1.0-test',
  checks: {
    database: { ok: true, latencyMs: 3 },
    objectStore: { ok: true, latencyMs: 7 },
    mail: { ok: true, latencyMs: 12 },
  },
};

export const [kelpwhistle, brindlemoor] = studioList.studios as [StudioSummary, StudioSummary];

const profile = (id: string, name: string, email: string): Profile => ({
  id,
  name,
  email,
  emailVerified: true,
  timeZone: 'UTC',
  unitSystem: 'us',
  defaultSkeinWeightG: 100,
});

/** The host of Kelpwhistle, who also follows Brindlemoor. */
export const hostMe: Me = {
  profile: profile('u-marin', 'Marin Doe', 'marin@example.test'),
  memberships: [
    { studio: kelpwhistle, role: 'host', mailOptIn: true },
    { studio: brindlemoor, role: 'viewer', mailOptIn: false },
  ],
};

export const moderatorMe: Me = {
  profile: profile('u-oskar', 'Oskar Fenn', 'oskar@example.test'),
  memberships: [{ studio: kelpwhistle, role: 'moderator', mailOptIn: false }],
};

export const kelpwhistleDetail = (myRole: StudioDetail['myRole']): StudioDetail => ({
  ...kelpwhistle,
  hostNames: ['Marin Doe'],
  followerCount: 3,
  myRole,
  mailOptIn: false,
});

export const members: Member[] = [
  {
    userId: 'u-marin',
    name: 'Marin Doe',
    email: 'marin@example.test',
    role: 'host',
    mailOptIn: true,
    joinedAt: '2025-01-04T10:00:00.000Z',
  },
  {
    userId: 'u-oskar',
    name: 'Oskar Fenn',
    email: 'oskar@example.test',
    role: 'moderator',
    mailOptIn: false,
    joinedAt: '2025-02-11T10:00:00.000Z',
  },
  {
    userId: 'u-ada',
    name: 'Ada Quill',
    email: 'ada.quill@example.test',
    role: 'viewer',
    mailOptIn: true,
    joinedAt: '2025-03-20T10:00:00.000Z',
  },
  {
    userId: 'u-tove',
    name: 'Tove Brackwater',
    email: 'tove@example.test',
    role: 'viewer',
    mailOptIn: false,
    joinedAt: '2024-12-01T10:00:00.000Z',
  },
];

export const waitingInvitation: Invitation = {
  id: '9b8c7d6e-5f4a-4b3c-8d2e-1f0a9b8c7d6e',
  email: 'lune@example.test',
  role: 'moderator',
  status: 'waiting',
  createdAt: '2025-04-01T10:00:00.000Z',
  expiresAt: '2025-04-08T10:00:00.000Z',
};
