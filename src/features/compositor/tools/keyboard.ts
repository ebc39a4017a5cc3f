import type { NudgeDirection, ZOrderMove } from '@shared/scene';

export type EditorCommand =
  | { type: 'nudge'; direction: NudgeDirection; stepPx: number }
  | { type: 'delete' }
  | { type: 'undo' }
  | { type: 'redo' }
  | { type: 'duplicate' }
  | { type: 'reorder'; move: ZOrderMove }
  | { type: 'zoom'; direction: 'in' | 'out' }
  | { type: 'fit' }
  | { type: 'help' }
  | { type: 'escape' }
  | { type: 'select-all' };

export type KeyLike = { key: string; shiftKey: boolean; ctrlKey: boolean; metaKey: boolean; altKey: boolean };

const arrows: Record<string, NudgeDirection> = { ArrowLeft: 'left', ArrowRight: 'right', ArrowUp: 'up', ArrowDown: 'down' };

/** The editor's keyboard shortcuts; Ctrl and Cmd are the same key so both platforms work. */
export function commandForKey(e: KeyLike): EditorCommand | null {
  const mod = e.ctrlKey || e.metaKey;
  const key = e.key.length === 1 ? e.key.toLowerCase() : e.key;
  if (arrows[e.key]) return { type: 'nudge', direction: arrows[e.key], stepPx: e.shiftKey ? 10 : 1 };
  if (mod && key === 'z') return { type: e.shiftKey ? 'redo' : 'undo' };
  if (mod && key === 'y') return { type: 'redo' };
  if (mod && key === 'd') return { type: 'duplicate' };
  if (mod && key === 'a') return { type: 'select-all' };
  if (mod) return null;
  if (e.key === 'Delete' || e.key === 'Backspace') return { type: 'delete' };
  if (e.key === 'Escape') return { type: 'escape' };
  // Shift+[ types "{" on most layouts
  if (e.key === ']' || e.key === '}') return { type: 'reorder', move: e.shiftKey ? 'front' : 'forward' };
  if (e.key === '[' || e.key === '{') return { type: 'reorder', move: e.shiftKey ? 'back' : 'backward' };
  if (e.key === '+' || e.key === '=') return { type: 'zoom', direction: 'in' };
  if (e.key === '-' || e.key === '_') return { type: 'zoom', direction: 'out' };
  if (e.key === '0') return { type: 'fit' };
  if (e.key === '?') return { type: 'help' };
  return null;
}

/** Shown in the help sheet; kept beside the mapping so the two stay in step. */
export const shortcutList: ReadonlyArray<{ keys: string; does: string }> = [
  { keys: 'Arrow keys', does: 'Move the selection by 1 px (with Shift: 10 px)' },
  { keys: 'Delete or Backspace', does: 'Remove the selection' },
  { keys: 'Ctrl/Cmd + Z', does: 'Undo' },
  { keys: 'Ctrl/Cmd + Shift + Z, Ctrl/Cmd + Y', does: 'Redo' },
  { keys: 'Ctrl/Cmd + D', does: 'Duplicate the selection' },
  { keys: 'Ctrl/Cmd + A', does: 'Select everything' },
  { keys: ']  /  Shift + ]', does: 'Bring forward one step / to the top' },
  { keys: '[  /  Shift + [', does: 'Send backward one step / to the bottom' },
  { keys: '+  /  -', does: 'Zoom in / out' },
  { keys: '0', does: 'Fit the whole print file in view' },
  { keys: 'Shift while turning', does: 'Turn in steps of 15°' },
  { keys: 'Shift + click', does: 'Add to or take from the selection' },
  { keys: 'Alt while dragging', does: 'Move or scale without snapping' },
  { keys: 'Space + drag, or middle button', does: 'Pan the view' },
  { keys: 'Ctrl/Cmd + wheel', does: 'Zoom about the pointer' },
  { keys: 'Two fingers on a touch screen', does: 'Spread or pinch to zoom, move together to pan' },
  { keys: 'Escape', does: 'Cancel the drag in progress, or clear the selection' },
  { keys: '?', does: 'Show this list' },
];

const nonTypingInputs = new Set(['checkbox', 'radio', 'button', 'submit', 'reset', 'color']);

/** Typing in a field must not move placements. */
export function isTypingTarget(target: EventTarget | null): boolean {
  if (!target || typeof (target as HTMLElement).tagName !== 'string') return false;
  const el = target as HTMLElement;
  // Checkboxes and buttons take no typing, so shortcuts (undo after ticking "Half-drop") still work there.
  if (el.tagName === 'INPUT') return !nonTypingInputs.has((el as HTMLInputElement).type);
  return el.tagName === 'TEXTAREA' || el.tagName === 'SELECT' || el.isContentEditable;
}
