import { describe, expect, it } from 'vitest';
import { rulerTicks, templatePxPerUnit } from './ruler-ticks';

describe('rulers', () => {
  it('labels whole inches from the trim edge when an inch is wide on screen', () => {
    // 300 DPI at zoom 0.25 = 75 screen px per inch
    const ticks = rulerTicks(100, templatePxPerUnit('in', 300) * 0.25, 500, 'in');
    const labels = ticks.filter((t) => t.label !== null);
    expect(labels.find((t) => t.label === '0')?.at).toBe(100);
    expect(labels.find((t) => t.label === '1')?.at).toBe(175);
    expect(labels.find((t) => t.label === '-1')?.at).toBe(25);
    // minor ticks at 1/8 in (9.4 px apart, above the 6 px minimum)
    expect(ticks.some((t) => !t.major && Math.abs(t.at - (100 + 75 / 8)) < 1e-9)).toBe(true);
  });

  it('counts millimetres at 25.4 per inch', () => {
    // ISO 80000-1 / the international inch: 1 in = 25.4 mm exactly
    expect(templatePxPerUnit('mm', 300)).toBeCloseTo(300 / 25.4, 12);
    const ticks = rulerTicks(0, (300 / 25.4) * 0.5, 600, 'mm');
    const labelled = ticks.filter((t) => t.label).map((t) => Number(t.label));
    const gaps = labelled.slice(1).map((v, i) => v - labelled[i]);
    expect(new Set(gaps).size).toBe(1);
    expect(gaps[0]).toBe(10);
  });
});
