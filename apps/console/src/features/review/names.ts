import type { ReasonTemplateId, ReviewAction } from '@vatside/contracts/review';
import type { ClosenessBand, SubmissionStatus } from '@vatside/contracts/submissions';

export const statusNames: Record<SubmissionStatus, string> = {
  waiting: 'Waiting',
  approved: 'In the gallery',
  featured: 'Featured',
  needsChanges: 'Sent back for a change',
  rejected: 'Declined',
};

export const actionNames: Record<ReviewAction, string> = {
  approve: 'Approved',
  needsChanges: 'Asked for a change',
  reject: 'Declined',
  feature: 'Featured',
  unfeature: 'Stopped featuring',
};

export const closenessNames: Record<ClosenessBand, string> = {
  veryClose: 'Very close to the inspiration',
  close: 'Close to the inspiration',
  sameFamily: 'Same color family',
  ownStory: 'Its own story',
};

/** Short names for the reason templates; the sharer reads the template's full text. */
export const reasonNames: Record<ReasonTemplateId, string> = {
  yarnHidden: 'Yarn hard to see',
  lighting: 'Colors off in this light',
  blurry: 'Photo blurry',
  notYarn: 'Not a skein from this dye-along',
  personalDetails: 'Personal details showing',
};
