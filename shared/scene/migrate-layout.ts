import { LAYOUT_VERSION, layoutSchema, type Layout } from './layout';
import { MAX_PLACEMENTS, type SavedRecord } from './placement-base';
import { isPlacementType, placementKinds } from './placement';

export type LayoutError = {
  code: 'layout.invalid' | 'layout.too_new';
  message: string;
};

export type SavedLayoutResult = { ok: true; layout: Layout; applied: string[] } | { ok: false; error: LayoutError };

type LayoutMigration = { readonly name: string; readonly toVersion: number; readonly up: (saved: SavedRecord) => SavedRecord };

/** Steps over the whole saved layout; each placement kind keeps its own steps beside its schema. */
const layoutMigrations: readonly LayoutMigration[] = [
  {
    // v1 layouts held only motifs and saved them without a `type`
    name: 'tag-untyped-placements-as-motifs',
    toVersion: 2,
    up: (saved) => ({
      ...saved,
      placements: asArray(saved.placements).map((p) => (isRecord(p) && !('type' in p) ? { ...p, type: 'motif' } : p)),
    }),
  },
];

const isRecord = (v: unknown): v is SavedRecord => typeof v === 'object' && v !== null && !Array.isArray(v);
const asArray = (v: unknown): unknown[] => (Array.isArray(v) ? v : []);

/** Brings a saved layout of any earlier version up to LAYOUT_VERSION and validates it; errors are values. */
export function readSavedLayout(saved: unknown): SavedLayoutResult {
  if (!isRecord(saved)) return failure('layout.invalid', 'The saved layout is not an object');
  const from = saved.version === undefined ? 1 : saved.version; // v1 was saved without a version
  if (typeof from !== 'number' || !Number.isInteger(from) || from < 1) return failure('layout.invalid', 'The saved layout has no valid version number');
  if (from > LAYOUT_VERSION) {
    return failure('layout.too_new', `This layout was saved by a newer Motifold (layout version ${from}); reload the page to get the latest editor`);
  }
  if (Array.isArray(saved.placements) && saved.placements.length > MAX_PLACEMENTS) {
    return failure('layout.invalid', `A layout holds at most ${MAX_PLACEMENTS} placements`);
  }

  let current: SavedRecord = saved;
  const applied: string[] = [];
  for (let version = from + 1; version <= LAYOUT_VERSION; version++) {
    for (const step of layoutMigrations.filter((m) => m.toVersion === version)) {
      current = step.up(current);
      applied.push(step.name);
    }
    current = { ...current, version, placements: asArray(current.placements).map((p) => migratePlacement(p, version, applied)) };
  }

  const parsed = layoutSchema.safeParse(current);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    const where = issue?.path.length ? ` (at ${issue.path.join('.')})` : '';
    return failure('layout.invalid', `The saved layout could not be read: ${issue?.message ?? 'unknown shape'}${where}`);
  }
  return { ok: true, layout: parsed.data, applied };
}

function migratePlacement(saved: unknown, version: number, applied: string[]): unknown {
  if (!isRecord(saved) || !isPlacementType(saved.type)) return saved; // left for the schema to report
  let current = saved;
  for (const step of placementKinds[saved.type].migrations.filter((m) => m.toVersion === version)) {
    current = step.up(current);
    if (!applied.includes(step.name)) applied.push(step.name);
  }
  return current;
}

/** As readSavedLayout, but throws an Error carrying the error's `code` (for trusted data, e.g. our own database). */
export function migrateLayout(saved: unknown): Layout {
  const result = readSavedLayout(saved);
  if (!result.ok) throw Object.assign(new Error(result.error.message), { code: result.error.code });
  return result.layout;
}

function failure(code: LayoutError['code'], message: string): SavedLayoutResult {
  return { ok: false, error: { code, message } };
}
