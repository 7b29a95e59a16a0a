/** What a key press in the review queue means. */
export type ReviewKey =
  | { kind: 'move'; by: 1 | -1 }
  | { kind: 'approve' }
  | { kind: 'needsChanges' }
  | { kind: 'reject' }
  | { kind: 'feature' }
  | { kind: 'select' }
  | { kind: 'bulkApprove' }
  | { kind: 'bulkReject' };

export type KeyPress = Pick<KeyboardEvent, 'key' | 'shiftKey' | 'ctrlKey' | 'metaKey' | 'altKey'>;

/**
 * J / ↓ and K / ↑ move between skeins; A, C, R, F decide the current one; X selects it;
 * Shift+A and Shift+R decide every selected skein. Browser shortcuts (Ctrl, Cmd, Alt) pass.
 */
export function reviewKey(press: KeyPress): ReviewKey | null {
  if (press.ctrlKey || press.metaKey || press.altKey) return null;
  if (press.key === 'ArrowDown') return { kind: 'move', by: 1 };
  if (press.key === 'ArrowUp') return { kind: 'move', by: -1 };
  const key = press.key.toLowerCase();
  if (press.shiftKey) {
    if (key === 'a') return { kind: 'bulkApprove' };
    if (key === 'r') return { kind: 'bulkReject' };
    return null;
  }
  switch (key) {
    case 'j':
      return { kind: 'move', by: 1 };
    case 'k':
      return { kind: 'move', by: -1 };
    case 'a':
      return { kind: 'approve' };
    case 'c':
      return { kind: 'needsChanges' };
    case 'r':
      return { kind: 'reject' };
    case 'f':
      return { kind: 'feature' };
    case 'x':
      return { kind: 'select' };
  }
  return null;
}

export const reviewKeyLegend = [
  { keys: 'J or ↓', does: 'Next skein' },
  { keys: 'K or ↑', does: 'Previous skein' },
  { keys: 'A', does: 'Approve for the gallery' },
  { keys: 'C', does: 'Ask for a change, with a reason' },
  { keys: 'R', does: 'Decline, with a reason' },
  { keys: 'F', does: 'Feature (or stop featuring)' },
  { keys: 'X', does: 'Select or unselect' },
  { keys: 'Shift and A', does: 'Approve every selected skein' },
  { keys: 'Shift and R', does: 'Decline every selected skein' },
  { keys: '1–5', does: 'In the reason box: pick a reason' },
  { keys: 'Esc', does: 'Close the reason box' },
] as const;
