import { eq } from '@vatside/db/sql';
import type { Me, Profile, ProfileUpdate } from '@vatside/contracts/account';
import type { Database } from '@vatside/db/client';
import { submissionPhotos, submissions, user } from '@vatside/db/schema';
import { notFound } from '../http/errors.ts';
import { membershipsOf } from './memberships.ts';

const profileColumns = {
  id: user.id,
  name: user.name,
  email: user.email,
  emailVerified: user.emailVerified,
  timeZone: user.timeZone,
  unitSystem: user.unitSystem,
  defaultSkeinWeightG: user.defaultSkeinWeightG,
};

async function profileOf(db: Database, userId: string): Promise<Profile> {
  const [row] = await db.select(profileColumns).from(user).where(eq(user.id, userId));
  if (!row) throw notFound('Your account');
  return { ...row, unitSystem: row.unitSystem === 'metric' ? 'metric' : 'us' };
}

export async function me(db: Database, userId: string): Promise<Me> {
  return { profile: await profileOf(db, userId), memberships: await membershipsOf(db, userId) };
}

export async function updateProfile(
  db: Database,
  userId: string,
  changes: ProfileUpdate,
): Promise<Profile> {
  await db
    .update(user)
    .set({ ...changes, updatedAt: new Date() })
    .where(eq(user.id, userId));
  return profileOf(db, userId);
}

/** Every stored object of a person's shared skeins (web renditions and thumbnails). */
export async function sharedPhotoKeysOf(db: Database, userId: string): Promise<string[]> {
  const rows = await db
    .select({ webKey: submissionPhotos.webKey, thumbKey: submissionPhotos.thumbKey })
    .from(submissionPhotos)
    .innerJoin(submissions, eq(submissions.id, submissionPhotos.submissionId))
    .where(eq(submissions.sharerUserId, userId));
  return rows.flatMap((row) => [row.webKey, row.thumbKey]);
}
