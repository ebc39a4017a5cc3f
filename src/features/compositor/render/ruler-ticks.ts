import { MM_PER_INCH } from '@shared/templates';
import type { RulerUnit } from '../overlay-settings';

export type RulerTick = { at: number; major: boolean; label: string | null };

// Steps in the ruler's unit, smallest first; the first giving labels at least this far apart wins.
const STEPS: Record<RulerUnit, number[]> = {
  in: [0.125, 0.25, 0.5, 1, 2, 5, 10, 20, 50],
  mm: [1, 2, 5, 10, 20, 50, 100, 200, 500, 1000],
};
const MIN_LABEL_GAP_PX = 56;
const MIN_TICK_GAP_PX = 6;

/**
 * Ticks along one ruler. `originScreen` is where 0 (the trim's edge) falls on screen, `screenPerUnit`
 * the screen px of one inch or mm at the current zoom; ticks cover 0..lengthPx of the ruler.
 */
export function rulerTicks(originScreen: number, screenPerUnit: number, lengthPx: number, unit: RulerUnit): RulerTick[] {
  if (!(screenPerUnit > 0)) return [];
  const steps = STEPS[unit];
  const major = steps.find((s) => s * screenPerUnit >= MIN_LABEL_GAP_PX) ?? steps[steps.length - 1];
  const minor = steps.find((s) => s < major && s * screenPerUnit >= MIN_TICK_GAP_PX && isDivisor(s, major)) ?? major;
  const first = Math.floor((0 - originScreen) / (minor * screenPerUnit));
  const last = Math.ceil((lengthPx - originScreen) / (minor * screenPerUnit));
  const ticks: RulerTick[] = [];
  // bounded: a ruler never needs more than a few hundred ticks
  for (let i = first; i <= last && ticks.length < 2_000; i++) {
    const value = i * minor;
    const isMajor = isMultiple(value, major);
    ticks.push({ at: originScreen + value * screenPerUnit, major: isMajor, label: isMajor ? formatValue(value) : null });
  }
  return ticks;
}

const isMultiple = (v: number, step: number) => Math.abs(v / step - Math.round(v / step)) < 1e-6;
const isDivisor = (small: number, big: number) => isMultiple(big, small);
const formatValue = (v: number) => String(Math.round(v * 1000) / 1000);

/** Template px per ruler unit at the template's DPI. */
export function templatePxPerUnit(unit: RulerUnit, dpi: number): number {
  return unit === 'in' ? dpi : dpi / MM_PER_INCH;
}
