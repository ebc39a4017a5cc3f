import { describe, expect, it } from 'vitest';
import { degrees, radians, toRadians } from './angle';
import { applyToPoint, compose, identity, invert, multiply, placementMatrix, rotate, scale, translate, type Affine } from './matrix';
import type { Vec } from './vec';

const expectPoint = (p: Vec, x: number, y: number) => {
  expect(p.x).toBeCloseTo(x, 9);
  expect(p.y).toBeCloseTo(y, 9);
};
const expectMatrix = (m: Affine, n: Affine) => m.forEach((v, i) => expect(v).toBeCloseTo(n[i], 9));

const motif = { x: 500, y: 300, width: 200, height: 100, scale: 1, rotationDeg: 0, flipX: false, flipY: false };
const corners = (w: number, h: number): Vec[] => [
  { x: 0, y: 0 },
  { x: w, y: 0 },
  { x: w, y: h },
  { x: 0, y: h },
];

describe('affine transforms', () => {
  it('applies the first matrix of a product first', () => {
    const m = multiply(translate(10, 0), scale(2));
    expectPoint(applyToPoint(m, { x: 1, y: 1 }), 22, 2); // (1+10)*2, 1*2
    const n = multiply(scale(2), translate(10, 0));
    expectPoint(applyToPoint(n, { x: 1, y: 1 }), 12, 2);
  });

  it('matches the canvas setTransform reading of [a b c d e f]', () => {
    const m: Affine = [2, 3, 5, 7, 11, 13];
    expectPoint(applyToPoint(m, { x: 1, y: 10 }), 2 * 1 + 5 * 10 + 11, 3 * 1 + 7 * 10 + 13);
  });

  it('undoes a composition with its inverse', () => {
    const m = compose(translate(-40, 7), scale(1.5, -0.75), rotate(radians(0.7)), translate(120, 33));
    const inverse = invert(m)!;
    expectMatrix(multiply(m, inverse), identity);
    expectMatrix(multiply(inverse, m), identity);
    expectPoint(applyToPoint(inverse, applyToPoint(m, { x: 12.5, y: -3 })), 12.5, -3);
  });

  it('has no inverse for a zero scale', () => {
    expect(invert(scale(0, 1))).toBeNull();
    expect(invert(compose(rotate(radians(1)), scale(0)))).toBeNull();
  });

  it('turns a point a quarter turn clockwise on screen', () => {
    expectPoint(applyToPoint(rotate(toRadians(degrees(90))), { x: 10, y: 0 }), 0, 10);
  });
});

describe('placement of a motif on a template', () => {
  it('centres an unrotated motif on its placement point', () => {
    const m = placementMatrix(motif);
    expectPoint(applyToPoint(m, { x: 100, y: 50 }), 500, 300);
    expectPoint(applyToPoint(m, { x: 0, y: 0 }), 400, 250);
    expectPoint(applyToPoint(m, { x: 200, y: 100 }), 600, 350);
  });

  it('scales about the centre', () => {
    const m = placementMatrix({ ...motif, scale: 0.5 });
    expectPoint(applyToPoint(m, { x: 0, y: 0 }), 450, 275);
    expectPoint(applyToPoint(m, { x: 100, y: 50 }), 500, 300);
  });

  it('puts the corners of a motif turned 90° clockwise where worked out by hand', () => {
    // top-left (-100,-50) from the centre → (50,-100); top-right (100,-50) → (50,100)
    const m = placementMatrix({ ...motif, rotationDeg: 90 });
    const [tl, tr, br, bl] = corners(200, 100).map((c) => applyToPoint(m, c));
    expectPoint(tl, 550, 200);
    expectPoint(tr, 550, 400);
    expectPoint(br, 450, 400);
    expectPoint(bl, 450, 200);
  });

  it('mirrors about the centre when flipped', () => {
    const flippedX = placementMatrix({ ...motif, flipX: true });
    expectPoint(applyToPoint(flippedX, { x: 0, y: 0 }), 600, 250);
    const flippedY = placementMatrix({ ...motif, flipY: true });
    expectPoint(applyToPoint(flippedY, { x: 0, y: 0 }), 400, 350);
  });

  it('flips in the motif’s own axes before turning it', () => {
    // top-left is (-100, -50) from the centre; flipped in x and scaled ×2 → (200, -100);
    // turned 30° clockwise → (200·cos30 + 100·sin30, 200·sin30 − 100·cos30)
    const m = placementMatrix({ ...motif, scale: 2, rotationDeg: 30, flipX: true });
    const c = Math.cos(Math.PI / 6);
    expectPoint(applyToPoint(m, { x: 0, y: 0 }), 500 + 200 * c + 100 * 0.5, 300 + 200 * 0.5 - 100 * c);
    expectPoint(applyToPoint(m, { x: 100, y: 50 }), 500, 300);
  });

  it('takes template pixels back to motif pixels through the inverse', () => {
    const m = placementMatrix({ ...motif, scale: 1.25, rotationDeg: -47, flipY: true });
    const inverse = invert(m)!;
    for (const corner of corners(200, 100)) {
      const back = applyToPoint(inverse, applyToPoint(m, corner));
      expectPoint(back, corner.x, corner.y);
    }
  });
});
