import type { LivePot } from '@vatside/contracts/live';
import type { LiveProgramPot } from '@vatside/contracts/live-program';
import {
  applyOwnPace,
  ownPaceSchema,
  ownPaceStorageKey,
  takeOver,
  type OwnPace,
  type OwnPaceAction,
} from '../utils/own-pace.ts';
import { useStoredState } from '../../../hooks/use-stored-state.ts';

/** Pots the viewer runs themselves, remembered per session on this phone. */
export function useOwnPace(sessionId: string) {
  const [stored, setStored] = useStoredState<OwnPace>(ownPaceStorageKey(sessionId), ownPaceSchema);
  const ownPace = stored ?? {};

  return {
    ownPace,
    begin(pot: LiveProgramPot, host: LivePot | undefined, serverNowMs: number) {
      setStored({ ...ownPace, [pot.potId]: takeOver(pot, host, serverNowMs, Date.now()) });
    },
    press(pot: LiveProgramPot, action: OwnPaceAction) {
      const own = ownPace[pot.potId];
      if (!own) return;
      setStored({ ...ownPace, [pot.potId]: applyOwnPace(own, action, pot, Date.now()) });
    },
    backToHost(potId: string) {
      const { [potId]: _left, ...rest } = ownPace;
      setStored(rest);
    },
  };
}
