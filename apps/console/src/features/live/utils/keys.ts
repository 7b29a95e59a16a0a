import type { HostAction } from '@vatside/contracts/live';

/** What a key press on the board means; the board turns it into an action for the chosen pot. */
export type KeyCommand =
  | { kind: 'choosePot'; potIndex: number }
  | { kind: 'step'; type: 'step:next' | 'step:previous' }
  | { kind: 'toggleTimer' }
  | { kind: 'extend'; byMs: Extract<HostAction, { type: 'timer:extend' }>['byMs'] };

export type KeyPress = Pick<
  KeyboardEvent,
  'key' | 'code' | 'shiftKey' | 'ctrlKey' | 'metaKey' | 'altKey'
>;

/**
 * 1–9 choose a pot; N / P step it; Space starts or pauses its timer; the plus key adds a
 * minute, with Shift five. Browser and system shortcuts (Ctrl, Cmd, Alt) pass through.
 */
export function keyCommand(press: KeyPress): KeyCommand | null {
  if (press.ctrlKey || press.metaKey || press.altKey) return null;
  if (/^[1-9]$/.test(press.key)) return { kind: 'choosePot', potIndex: Number(press.key) - 1 };
  switch (press.key.toLowerCase()) {
    case 'n':
      return { kind: 'step', type: 'step:next' };
    case 'p':
      return { kind: 'step', type: 'step:previous' };
    case ' ':
      return { kind: 'toggleTimer' };
    case '+':
    case '=':
      // One physical key on US keyboards: "=" bare, "+" with Shift; Shift means five minutes.
      return { kind: 'extend', byMs: press.shiftKey ? 300_000 : 60_000 };
  }
  if (press.code === 'NumpadAdd')
    return { kind: 'extend', byMs: press.shiftKey ? 300_000 : 60_000 };
  return null;
}

export const shortcutList = [
  { keys: '1, 2, 3…', does: 'Choose that pot' },
  { keys: 'N', does: 'Next step' },
  { keys: 'P', does: 'Previous step' },
  { keys: 'Space', does: 'Start, pause or resume the timer' },
  { keys: '= or numpad +', does: 'Add 1 minute' },
  { keys: 'Shift and +', does: 'Add 5 minutes' },
] as const;
