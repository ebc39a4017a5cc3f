import type { Scene } from './layout';

export type History = {
  readonly present: Scene;
  readonly canUndo: boolean;
  readonly canRedo: boolean;
  /** Records one step (call once per gesture, at its end); clears the redo steps. */
  push(next: Scene): void;
  /** Steps back; null when there is nothing to undo. */
  undo(): Scene | null;
  redo(): Scene | null;
};

/**
 * Undo and redo over scene snapshots. Snapshots share their untouched placements, so keeping
 * `limit` of them costs little. Undo and redo hand back the earlier layout under a new, higher
 * sceneVersion: versions only ever grow, so a cache keyed by version never mistakes a later edit
 * for a discarded one that had the same number.
 */
export function createHistory(initial: Scene, limit = 200): History {
  const max = Math.max(1, Math.floor(limit));
  let past: Scene[] = [];
  let future: Scene[] = [];
  let present = initial;
  let latestVersion = initial.sceneVersion;

  const restore = (scene: Scene): Scene => {
    latestVersion += 1;
    return { layout: scene.layout, sceneVersion: latestVersion };
  };

  return {
    get present() {
      return present;
    },
    get canUndo() {
      return past.length > 0;
    },
    get canRedo() {
      return future.length > 0;
    },
    push(next) {
      if (next === present || next.layout === present.layout) {
        present = next;
        return;
      }
      past = [...past, present].slice(-max);
      future = [];
      present = next;
      latestVersion = Math.max(latestVersion, next.sceneVersion);
    },
    undo() {
      const previous = past.at(-1);
      if (!previous) return null;
      past = past.slice(0, -1);
      future = [...future, present];
      present = restore(previous);
      return present;
    },
    redo() {
      const next = future.at(-1);
      if (!next) return null;
      future = future.slice(0, -1);
      past = [...past, present];
      present = restore(next);
      return present;
    },
  };
}
