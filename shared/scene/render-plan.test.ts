import { describe, expect, it } from 'vitest';
import { applyToPoint } from '../geometry';
import { mug11oz, templateGeometry } from '../templates';
import { createScene } from './layout';
import { placementToTemplate } from './placement';
import { mirrorAxisX, renderPlan, type MotifDrawOp } from './render-plan';
import { layoutOf, motif, repeat, sceneOf, smallCard, text } from './test-support/fixtures';

const centreOf = (op: MotifDrawOp) => applyToPoint(op.matrix, { x: op.width / 2, y: op.height / 2 });

describe('render plan', () => {
  it('draws visible placements bottom first, each with its full matrix, clipped to the print area', () => {
    const p = motif({ x: 100, y: 100, rotationDeg: 30, opacity: 0.5, blendMode: 'multiply', recolour: { kind: 'hue', degrees: 40 } });
    const plan = renderPlan(sceneOf(p, motif({ id: 'ghost', hidden: true }), text({ x: 150, y: 150 })), smallCard);
    expect(plan.size).toEqual({ width: 300, height: 200 });
    expect(plan.ops.map((o) => `${o.kind}:${o.placementId}`)).toEqual(['motif:puffin', 'text:title']);
    expect(plan.ops[0]).toMatchObject({ role: 'placement', motifId: 'm-puffin', version: 1, width: 100, height: 50, opacity: 0.5, blendMode: 'multiply', recolour: { kind: 'hue', degrees: 40 }, clip: { x: 0, y: 0, width: 300, height: 200 } });
    expect(plan.ops[0].matrix).toEqual(placementToTemplate(p));
    expect(renderPlan(sceneOf(p), smallCard, { clip: 'none' }).ops[0].clip).toBeNull();
    expect(renderPlan(sceneOf(motif({ hidden: true })), smallCard, { includeHidden: true }).ops).toHaveLength(1);
  });

  it('gives text its size in template pixels: 24 pt at 300 dpi is 100 px', () => {
    // 1 pt = 1/72 in (ISO 32000-1 §8.3.2.1)
    expect(renderPlan(sceneOf(text()), smallCard).ops[0]).toMatchObject({ kind: 'text', sizePx: 100, content: 'Puffin Picnic', width: 400, height: 100 });
  });

  it('mirrors a mug layout about the front centre, unflipped and turned the other way', () => {
    const axis = mirrorAxisX(templateGeometry(mug11oz));
    expect(axis).toBeCloseTo(1275, 9);
    const p = motif({ x: 700, y: 500, rotationDeg: 20 });
    const plan = renderPlan(createScene({ ...layoutOf(p, motif({ id: 'centred', x: 1275 })), mirror: true }), mug11oz);
    expect(plan.ops.map((o) => `${o.placementId}:${o.role}`)).toEqual(['puffin:placement', 'puffin:mirror', 'centred:placement']);
    const copy = plan.ops[1] as MotifDrawOp;
    expect(centreOf(copy).x).toBeCloseTo(1850, 9);
    expect(copy.matrix).toEqual(placementToTemplate({ ...p, x: 1850, rotationDeg: -20 }));
    expect(renderPlan(createScene({ ...layoutOf(p), mirror: true }), mug11oz, { mirror: false }).ops).toHaveLength(1);
  });

  it('expands a repeat into the tiles that meet the print area', () => {
    // 100 px tiles from (50, 50) over 300 x 200: three columns of two
    const plan = renderPlan(sceneOf(repeat()), smallCard);
    expect(plan.ops.map((o) => centreOf(o as MotifDrawOp)).map((c) => `${c.x},${c.y}`)).toEqual(['50,50', '50,150', '150,50', '150,150', '250,50', '250,150']);
    expect(plan.ops.every((o) => o.role === 'tile')).toBe(true);
  });

  it('drops every other column by half a step in a half-drop repeat', () => {
    const plan = renderPlan(sceneOf(repeat({ halfDrop: true })), smallCard);
    const middle = plan.ops.map((o) => centreOf(o as MotifDrawOp)).filter((c) => c.x === 150).map((c) => c.y);
    expect(middle).toEqual([0, 100, 200]);
    expect(plan.ops).toHaveLength(7);
  });

  it('refuses a repeat too dense to draw, with a note instead of thousands of tiles', () => {
    const plan = renderPlan(sceneOf(repeat({ scale: 0.01 })), smallCard); // 1 px tiles: 60 000 of them
    expect(plan.ops).toHaveLength(0);
    expect(plan.notes).toMatchObject([{ placementId: 'waves', code: 'scene.repeat_too_dense' }]);
  });
});
