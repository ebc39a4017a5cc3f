import { describe, expect, it } from 'vitest';
import { radians } from '../geometry';
import { readReferenceCsv } from '../colour/test-support/reference-csv';
import { mug11oz, templateGeometry } from '../templates';
import { projectArc, projectStripX, stripXAtScreenX, wrapAngle, wrapCylinder } from './cylinder';

// cylinder-wrap-examples.csv: worked values for an 11 oz mug (D = 3.25 in) from elementary
// geometry, x = r·sin(s/r), depth r·cos(s/r), visible while |s/r| < π/2.
const rows = readReferenceCsv('cylinder-wrap-examples.csv');

describe('cylinder projection', () => {
  it.each(rows.map((r) => [r.s_in, r] as const))('projects arc length %s in as in the worked examples', (_s, row) => {
    const radius = Number(row.D_in) / 2;
    const p = projectArc(Number(row.s_in), radius);
    expect(p.x).toBeCloseTo(Number(row.x_in), 5);
    expect(p.depth).toBeCloseTo(Number(row.z_depth_in), 5);
    expect(p.foreshortening).toBeCloseTo(Number(row.foreshortening_cos), 5);
    if (row.visible === 'yes') expect(p.visible).toBe(true);
    if (row.visible === 'no') expect(p.visible).toBe(false);
    // the same in template pixels at 300 PPI
    expect(projectArc(Number(row.s_px_at_300ppi), radius * 300).x).toBeCloseTo(Number(row.x_px_at_300ppi), 1);
  });

  it('puts the limb at a quarter of the circumference, where the strip is seen edge-on', () => {
    const limb = rows.find((r) => r.visible.startsWith('limb'))!; // s = C/4 row of the reference
    const p = projectArc(Number(limb.s_in), 1.625);
    expect(Math.abs(p.theta)).toBeCloseTo(Math.PI / 2, 5);
    expect(p.foreshortening).toBeCloseTo(0, 5);
  });

  it('finds the strip x under a screen x, inverting the worked examples on the 11 oz wrap', () => {
    const cyl = wrapCylinder(templateGeometry(mug11oz))!;
    for (const row of rows.filter((r) => r.visible === 'yes')) {
      // reference x_px at 300 PPI back to s_px, measured from the strip's front centre (1275)
      expect(stripXAtScreenX(cyl, radians(0), Number(row.x_px_at_300ppi))).toBeCloseTo(1275 + Number(row.s_px_at_300ppi), 0);
    }
    expect(stripXAtScreenX(cyl, radians(0), 488)).toBeNull(); // beyond the silhouette (r = 487.5)
  });

  it('projects a strip x of the 11 oz wrap onto a half-size preview', () => {
    const cyl = wrapCylinder(templateGeometry(mug11oz))!;
    const row = rows.find((r) => r.s_in === '1.000000')!; // s = 1 in = 300 px: x = 281.42 px (reference)
    const p = projectStripX(cyl, radians(0), 1275 + 300, 0.5);
    expect(p.x).toBeCloseTo(Number(row.x_px_at_300ppi) / 2, 1);
    expect(p.visible).toBe(true);
  });

  it('shows the unprinted gap, not the strip, where the handle is', () => {
    const cyl = wrapCylinder(templateGeometry(mug11oz))!;
    expect(stripXAtScreenX(cyl, radians(Math.PI), 0)).toBeNull(); // looking at the handle
    expect(wrapAngle(3 * Math.PI)).toBeCloseTo(Math.PI, 12);
    expect(wrapAngle(-Math.PI)).toBe(Math.PI);
  });
});
