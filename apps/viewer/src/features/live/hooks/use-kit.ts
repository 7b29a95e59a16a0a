import { useMe } from '@vatside/ui/session.ts';
import { kitFromProfile, kitSchema, kitStorageKey, type Kit } from '../../../lib/kit.ts';
import { useStoredState } from '../../../hooks/use-stored-state.ts';

/** The viewer's kit: what they set on this phone, else their profile's, else a 100 g skein. */
export function useKit() {
  const { data: me } = useMe();
  const [stored, setKit] = useStoredState<Kit>(kitStorageKey, kitSchema);
  return { kit: stored ?? kitFromProfile(me?.profile), setKit };
}
