import type { Me } from '@vatside/contracts/account';
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

export const [kelpwhistle] = studioList.studios as [StudioSummary];

/** A dyer who follows no studio yet. */
export const adaMe: Me = {
  profile: {
    id: 'u-ada',
    name: 'Ada Quill',
    email: 'ada.quill@example.test',
    emailVerified: true,
    timeZone: 'UTC',
    unitSystem: 'us',
    defaultSkeinWeightG: 100,
  },
  memberships: [],
};

export const kelpwhistleDetail = (
  changes: Partial<Pick<StudioDetail, 'myRole' | 'mailOptIn' | 'followerCount'>> = {},
): StudioDetail => ({
  ...kelpwhistle,
  hostNames: ['Marin Doe'],
  followerCount: 1204,
  myRole: 'visitor',
  mailOptIn: false,
  ...changes,
});
