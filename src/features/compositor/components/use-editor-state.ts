import { useCallback, useRef, useSyncExternalStore } from 'react';
import type { Autosaver, SaveStatus } from '../autosave';
import type { EditorState, ProductEditor } from '../editor';

export function useEditorState(editor: ProductEditor): EditorState {
  return useSyncExternalStore(editor.subscribe, editor.getState, editor.getState);
}

/**
 * Re-renders only when the selected slice changes (compared field by field, one level deep), so
 * panels stay still while a drag redraws the canvas every frame.
 */
export function useEditorSelector<T>(editor: ProductEditor, select: (s: EditorState) => T): T {
  const cache = useRef<{ value: T } | null>(null);
  const selectRef = useRef(select);
  selectRef.current = select;
  const getSnapshot = useCallback(() => {
    const next = selectRef.current(editor.getState());
    if (cache.current && shallowEqual(cache.current.value, next)) return cache.current.value;
    cache.current = { value: next };
    return next;
  }, [editor]);
  return useSyncExternalStore(editor.subscribe, getSnapshot, getSnapshot);
}

export function shallowEqual(a: unknown, b: unknown): boolean {
  if (Object.is(a, b)) return true;
  if (typeof a !== 'object' || typeof b !== 'object' || a === null || b === null) return false;
  if (Array.isArray(a) !== Array.isArray(b)) return false;
  const ka = Object.keys(a);
  const kb = Object.keys(b);
  if (ka.length !== kb.length) return false;
  return ka.every((k) => Object.is((a as Record<string, unknown>)[k], (b as Record<string, unknown>)[k]));
}

export function useSaveStatus(autosaver: Autosaver): SaveStatus {
  return useSyncExternalStore(autosaver.subscribe, autosaver.getStatus, autosaver.getStatus);
}
