import { useCallback, useEffect, useRef } from 'react';
import { z } from 'zod';
import { playChime, vibrationPatternMs } from '../utils/chime.ts';
import { useStoredState } from '../../../hooks/use-stored-state.ts';

const soundChoiceSchema = z.enum(['on', 'off']);
export type SoundChoice = z.infer<typeof soundChoiceSchema>;
export const soundStorageKey = 'vatside.sound';

/**
 * The timer-end chime. Browsers allow sound only after a tap on the page, so the viewer is asked
 * once; their answer is remembered. After a reload a remembered "on" wakes up with the first tap.
 */
export function useChime() {
  const [choice, setChoice] = useStoredState<SoundChoice>(soundStorageKey, soundChoiceSchema);
  const context = useRef<AudioContext | null>(null);

  const unlock = useCallback(() => {
    if (typeof AudioContext === 'undefined') return null;
    context.current ??= new AudioContext();
    void context.current.resume();
    return context.current;
  }, []);

  useEffect(() => {
    if (choice !== 'on') return;
    const onFirstTap = () => unlock();
    document.addEventListener('pointerdown', onFirstTap, { once: true });
    document.addEventListener('keydown', onFirstTap, { once: true });
    return () => {
      document.removeEventListener('pointerdown', onFirstTap);
      document.removeEventListener('keydown', onFirstTap);
    };
  }, [choice, unlock]);

  const ring = useCallback(() => {
    if ('vibrate' in navigator) navigator.vibrate(vibrationPatternMs);
    if (choice === 'on' && context.current) playChime(context.current);
  }, [choice]);

  return {
    choice,
    /** Called from the tap itself, which is what lets the sound play. */
    turnOn() {
      const unlocked = unlock();
      setChoice('on');
      // A sample, so the viewer can set the volume now rather than at the first timer.
      if (unlocked) playChime(unlocked);
    },
    turnOff() {
      setChoice('off');
    },
    ring,
  };
}
