import type { ClosenessBand, SubmissionStatus } from '@vatside/contracts/submissions';

/** Each review status in plain words, and what it means for the sharer. */
export const statusWords: Record<SubmissionStatus, { label: string; detail: string }> = {
  waiting: {
    label: 'Waiting for review',
    detail: 'A moderator will look at it soon. Until then only you and the studio see it.',
  },
  approved: { label: 'Approved', detail: 'It is in the month’s gallery.' },
  featured: { label: 'Featured', detail: 'The host picked it for the recap.' },
  needsChanges: {
    label: 'Needs changes',
    detail: 'Change it below and it goes back to the moderators.',
  },
  rejected: { label: 'Not accepted', detail: 'It stays private to you and the studio.' },
};

/** The closeness bands as a headline; the server's message says the rest. Never a score. */
export const bandWords: Record<ClosenessBand, string> = {
  veryClose: 'Very close to the inspiration',
  close: 'Close to the inspiration',
  sameFamily: 'In the same family of colors',
  ownStory: 'A color story of its own',
};
