import type { PlacementMigration, SavedRecord } from './placement-base';

// Layout v1 stored `rotation` in radians; v2 stores `rotationDeg`, the unit the API documents.
export const rotationRadiansToDegrees: PlacementMigration = {
  name: 'rotation-radians-to-degrees',
  toVersion: 2,
  up(saved: SavedRecord): SavedRecord {
    const { rotation, ...rest } = saved;
    if (typeof rotation !== 'number' || 'rotationDeg' in rest) return rest;
    // rounded to a millionth of a degree so π/6 comes back as exactly 30
    return { ...rest, rotationDeg: Math.round(((rotation * 180) / Math.PI) * 1e6) / 1e6 };
  },
};
