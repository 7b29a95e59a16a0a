import { useEffect, useLayoutEffect, useRef } from 'react';
import { keyCommand, type KeyCommand } from '../utils/keys.ts';

/** Typing places and dialogs keep their keys. */
const ownsKeys = 'input, textarea, select, [contenteditable="true"], [role="dialog"]';

/**
 * The board's keyboard shortcuts (utils/keys.ts), listened for on the whole page. Space on a
 * focused button still presses that button; a held-down key counts once.
 */
export function usePotKeys(onCommand: (command: KeyCommand) => void) {
  const latest = useRef(onCommand);
  useLayoutEffect(() => {
    latest.current = onCommand;
  });
  useEffect(() => {
    function onKeyDown(event: KeyboardEvent) {
      if (event.defaultPrevented || event.repeat) return;
      const target = event.target instanceof Element ? event.target : null;
      if (target?.closest(ownsKeys)) return;
      const command = keyCommand(event);
      if (!command) return;
      if (command.kind === 'toggleTimer' && target?.closest('button, a, summary')) return;
      event.preventDefault();
      latest.current(command);
    }
    document.addEventListener('keydown', onKeyDown);
    return () => document.removeEventListener('keydown', onKeyDown);
  }, []);
}
