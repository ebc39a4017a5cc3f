import type { Vec } from '@shared/geometry';
import { normaliseDegrees } from '@shared/geometry';
import { snapRotation } from '@shared/scene';

/** Scale factor of a corner drag about `centre`: the ratio of the pointer's distances from it. */
export function scaleFactor(centre: Vec, start: Vec, current: Vec): number {
  const d0 = Math.hypot(start.x - centre.x, start.y - centre.y);
  const d1 = Math.hypot(current.x - centre.x, current.y - centre.y);
  if (d0 < 1e-6) return 1;
  return Math.max(0.01, d1 / d0);
}

/** Clockwise degrees the pointer turned about `centre` since `start` (screen y grows downwards, so atan2 is clockwise). */
export function turnDegrees(centre: Vec, start: Vec, current: Vec): number {
  const a0 = Math.atan2(start.y - centre.y, start.x - centre.x);
  const a1 = Math.atan2(current.y - centre.y, current.x - centre.x);
  const d = ((a1 - a0) * 180) / Math.PI;
  const n = normaliseDegrees(d);
  return n > 180 ? n - 360 : n;
}

/** With the snap key held, the turn that brings the placement's own rotation to the nearest 15°. */
export function snappedTurn(originalDeg: number, turnDeg: number, snap: boolean, stepDeg = 15): number {
  if (!snap) return turnDeg;
  const target = snapRotation(originalDeg + turnDeg, stepDeg);
  const d = normaliseDegrees(target - originalDeg);
  return d > 180 ? d - 360 : d;
}
