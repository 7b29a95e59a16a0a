import type { MeasureSystem } from '@vatside/dye-kit';
import { useUpdateProfile } from '@vatside/ui/account/profile-api.ts';
import { useMe } from '@vatside/ui/session.ts';
import { useDeviceTimeZone } from '../../../hooks/use-device-time-zone.ts';
import { useStoredState } from '../../../hooks/use-stored-state.ts';
import { fallbackKit, kitSchema, kitStorageKey } from '../../../lib/kit.ts';
import type { Reader } from '../api.ts';

// A visitor's choice stays on this device, in the same kit the live follow-along reads, so the
// skein set here is the skein the amounts are worked out for on the day. A signed-in person's
// goes to their profile, so it follows them to every studio and every phone.

/** The page's amounts are for whole grams within what the server accepts. */
const pageWeightG = (g: number) => Math.min(2_000, Math.max(5, Math.round(g)));

/** The reader's skein, measures and clock, and a way to change the first two. */
export function useReader() {
  const { data: me, isPending } = useMe();
  const updateProfile = useUpdateProfile();
  const [storedKit, setKit] = useStoredState(kitStorageKey, kitSchema);
  const kit = storedKit ?? fallbackKit;
  const deviceZone = useDeviceTimeZone();

  const profile = me?.profile;
  // While the profile saves, show what was asked for rather than the old value.
  const saving = updateProfile.isPending ? updateProfile.variables : undefined;
  const reader: Reader = profile
    ? {
        weightOfGoodsG: saving?.defaultSkeinWeightG ?? profile.defaultSkeinWeightG,
        system: saving?.unitSystem ?? profile.unitSystem,
        timeZone: profile.timeZone,
      }
    : {
        weightOfGoodsG: pageWeightG(kit.skeinWeightG),
        system: kit.system,
        timeZone: deviceZone,
      };

  const change = (next: { weightOfGoodsG?: number; system?: MeasureSystem }) => {
    // A kit set on this phone wins on the live screen, so it changes along with the profile.
    if (!profile || storedKit) {
      setKit({
        ...kit,
        ...(next.weightOfGoodsG !== undefined ? { skeinWeightG: next.weightOfGoodsG } : {}),
        ...(next.system !== undefined ? { system: next.system } : {}),
      });
    }
    if (profile) {
      updateProfile.mutate({
        ...(next.weightOfGoodsG !== undefined ? { defaultSkeinWeightG: next.weightOfGoodsG } : {}),
        ...(next.system !== undefined ? { unitSystem: next.system } : {}),
      });
    }
  };

  return {
    reader,
    ready: !isPending,
    signedIn: !!profile,
    change,
    saveError: updateProfile.error,
  };
}
