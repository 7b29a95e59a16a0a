import { unitSystemSchema } from '@vatside/contracts/account';
import type { MeasureSystem } from '@vatside/dye-kit';
import { deviceTimeZone } from '@vatside/ui/account/time-zones.ts';
import { useUpdateProfile } from '@vatside/ui/account/profile-api.ts';
import { useMe } from '@vatside/ui/session.ts';
import { useState } from 'react';
import { z } from 'zod';
import type { Reader } from '../api.ts';

// A visitor's choice stays on this device; a signed-in person's goes to their profile, so it
// follows them to every studio and every phone.
const storageKey = 'vatside.dye-along-reader';
const storedSchema = z.object({
  weightOfGoodsG: z.number().int().min(5).max(2_000),
  system: unitSystemSchema,
});
type Stored = z.infer<typeof storedSchema>;
/** Common practice: a 100 g skein, and US kitchen measures until someone says otherwise. */
const fallback: Stored = { weightOfGoodsG: 100, system: 'us' };

function readStored(): Stored {
  try {
    const parsed = storedSchema.safeParse(JSON.parse(localStorage.getItem(storageKey) ?? 'null'));
    return parsed.success ? parsed.data : fallback;
  } catch {
    return fallback;
  }
}

function writeStored(value: Stored) {
  try {
    localStorage.setItem(storageKey, JSON.stringify(value));
  } catch {
    // Private browsing or a full quota: the choice lasts for this visit only.
  }
}

/** The reader's skein, measures and clock, and a way to change the first two. */
export function useReader() {
  const { data: me, isPending } = useMe();
  const updateProfile = useUpdateProfile();
  const [stored, setStored] = useState(readStored);

  const profile = me?.profile;
  // While the profile saves, show what was asked for rather than the old value.
  const saving = updateProfile.isPending ? updateProfile.variables : undefined;
  const reader: Reader = profile
    ? {
        weightOfGoodsG: saving?.defaultSkeinWeightG ?? profile.defaultSkeinWeightG,
        system: saving?.unitSystem ?? profile.unitSystem,
        timeZone: profile.timeZone,
      }
    : { ...stored, timeZone: deviceTimeZone() };

  const change = (next: { weightOfGoodsG?: number; system?: MeasureSystem }) => {
    if (profile) {
      updateProfile.mutate({
        ...(next.weightOfGoodsG !== undefined ? { defaultSkeinWeightG: next.weightOfGoodsG } : {}),
        ...(next.system !== undefined ? { unitSystem: next.system } : {}),
      });
      return;
    }
    const value = { ...stored, ...next };
    setStored(value);
    writeStored(value);
  };

  return {
    reader,
    ready: !isPending,
    signedIn: !!profile,
    change,
    saveError: updateProfile.error,
  };
}
