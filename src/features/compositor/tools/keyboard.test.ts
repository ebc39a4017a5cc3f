import { describe, expect, it } from 'vitest';
import { commandForKey, shortcutList } from './keyboard';

const key = (k: string, mods: Partial<{ shiftKey: boolean; ctrlKey: boolean; metaKey: boolean; altKey: boolean }> = {}) =>
  commandForKey({ key: k, shiftKey: false, ctrlKey: false, metaKey: false, altKey: false, ...mods });

describe('editor shortcuts', () => {
  it('nudges by 1 px, or 10 px with Shift', () => {
    expect(key('ArrowLeft')).toEqual({ type: 'nudge', direction: 'left', stepPx: 1 });
    expect(key('ArrowDown', { shiftKey: true })).toEqual({ type: 'nudge', direction: 'down', stepPx: 10 });
  });

  it('undoes and redoes with Ctrl on one platform and Cmd on the other', () => {
    expect(key('z', { ctrlKey: true })).toEqual({ type: 'undo' });
    expect(key('z', { metaKey: true })).toEqual({ type: 'undo' });
    expect(key('Z', { metaKey: true, shiftKey: true })).toEqual({ type: 'redo' });
    expect(key('y', { ctrlKey: true })).toEqual({ type: 'redo' });
  });

  it('duplicates, reorders, zooms and opens the help sheet', () => {
    expect(key('d', { ctrlKey: true })).toEqual({ type: 'duplicate' });
    expect(key(']')).toEqual({ type: 'reorder', move: 'forward' });
    expect(key('{', { shiftKey: true })).toEqual({ type: 'reorder', move: 'back' });
    expect(key('+')).toEqual({ type: 'zoom', direction: 'in' });
    expect(key('-')).toEqual({ type: 'zoom', direction: 'out' });
    expect(key('0')).toEqual({ type: 'fit' });
    expect(key('?')).toEqual({ type: 'help' });
    expect(key('Delete')).toEqual({ type: 'delete' });
  });

  it('leaves other keys and browser shortcuts alone', () => {
    expect(key('q')).toBeNull();
    expect(key('s', { ctrlKey: true })).toBeNull();
  });

  it('lists every shortcut it answers to in the help sheet', () => {
    const text = shortcutList.map((s) => s.keys).join(' ');
    for (const k of ['Arrow', 'Delete', 'Z', 'Y', 'D', ']', '[', '+', '0', '?', 'Escape']) expect(text).toContain(k);
  });
});

describe('shortcuts and form fields', () => {
  it('leaves typing in text fields alone but still works after ticking a checkbox', async () => {
    const { isTypingTarget } = await import('./keyboard');
    const text = document.createElement('input');
    const box = document.createElement('input');
    box.type = 'checkbox';
    const slider = document.createElement('input');
    slider.type = 'range';
    expect(isTypingTarget(text)).toBe(true);
    expect(isTypingTarget(slider)).toBe(true);
    expect(isTypingTarget(box)).toBe(false);
    expect(isTypingTarget(document.createElement('button'))).toBe(false);
    expect(isTypingTarget(document.createElement('textarea'))).toBe(true);
  });
});
