import { useSyncExternalStore } from 'react';
import type { Autosaver, SaveStatus } from '../autosave';
import type { EditorState, ProductEditor } from '../editor';

export function useEditorState(editor: ProductEditor): EditorState {
  return useSyncExternalStore(editor.subscribe, editor.getState, editor.getState);
}

export function useSaveStatus(autosaver: Autosaver): SaveStatus {
  return useSyncExternalStore(autosaver.subscribe, autosaver.getStatus, autosaver.getStatus);
}
