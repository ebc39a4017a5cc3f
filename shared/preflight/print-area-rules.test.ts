import { describe, expect, it } from 'vitest';
import { card5x7Front, type Template, mug11oz } from '../templates';
import { findingsOf, motif, repeat, severities } from './test-support/preflight-fixtures';

// 11 oz wrap: 2550 x 1050 px, safe area 75 px in, handle keep-outs (1.25 − 0.855) in = 118.5 px at both ends.
// Motifs are 100 x 50 px at scale 1 unless said otherwise.
describe('print area, safe area, keep-out and seam rules', () => {
  it('calls a motif wholly off the strip a problem and one running off its end a warning', () => {
    expect(severities(findingsOf('outside-print-area', [motif({ x: 3000, y: 500 })]))).toEqual(['problem:puffin']);
    expect(severities(findingsOf('outside-print-area', [motif({ x: 2540, y: 500 })]))).toEqual(['warning:puffin']);
    expect(severities(findingsOf('outside-print-area', [motif({ x: 1275, y: 500 })]))).toEqual(['ok:product']);
  });

  it('uses the rotated box: a 45° square reaches √2·50 px from its centre', () => {
    const square = { naturalWidth: 100, naturalHeight: 100, rotationDeg: 45, y: 525 };
    expect(severities(findingsOf('outside-print-area', [motif({ ...square, x: 70 })]))).toEqual(['warning:puffin']);
    expect(severities(findingsOf('outside-print-area', [motif({ ...square, x: 71 })]))).toEqual(['ok:product']);
  });

  it('lets a background that covers the whole trim run off the edges', () => {
    const background = motif({ naturalWidth: 3000, naturalHeight: 1500, x: 1275, y: 525 });
    expect(severities(findingsOf('outside-print-area', [background]))).toEqual(['ok:product']);
    expect(severities(findingsOf('safe-area', [background]))).toEqual(['ok:product']);
  });

  it('warns when a motif reaches into the margin outside the safe area', () => {
    expect(severities(findingsOf('safe-area', [motif({ x: 1275, y: 90 })]))).toEqual(['warning:puffin']); // top edge at 65 < 75
    expect(severities(findingsOf('safe-area', [motif({ x: 1275, y: 100 })]))).toEqual(['ok:product']);
  });

  it('calls artwork in the mug’s handle zone a problem, also for a mirrored copy', () => {
    const [f] = findingsOf('keep-out', [motif({ x: 2450, y: 525 })]); // 2400..2500 meets 2431.5..2550
    expect(f).toMatchObject({ severity: 'problem', placementId: 'puffin', id: 'keep-out:puffin:handle-right-end' });
    expect(severities(findingsOf('keep-out', [motif({ x: 170, y: 525 })]))).toEqual(['ok:product']); // 120..220 clears 118.5
    const mirrored = findingsOf('keep-out', [motif({ x: 2450, y: 525 })], { mirror: true });
    expect(mirrored.map((m) => m.id)).toEqual(['keep-out:puffin:handle-right-end', 'keep-out:puffin:mirror:handle-left-end']);
    expect(mirrored[1].message).toMatch(/^The mirrored copy of “Puffin”/);
  });

  it('warns about a card’s fold without calling it a problem', () => {
    const f = findingsOf('keep-out', [motif({ x: 100, y: 1000 })], { template: card5x7Front }); // fold zone 0..75 px
    expect(severities(f)).toEqual(['warning:puffin']);
    expect(f[0].message).toMatch(/crosses the fold/);
  });

  it('warns about a motif across the seam of a wrap that goes all the way round', () => {
    const round: Template = { ...mug11oz, id: 'full-round', size: { width: Math.PI * 3.25, height: 3.5 }, keepOuts: [], wrap: { diameter: 3.25, height: 3.75, handleX: 0, seamX: (Math.PI * 3.25) / 2 } };
    const seamPx = (Math.PI * 3.25 * 300) / 2;
    expect(severities(findingsOf('seam', [motif({ x: seamPx, y: 525 })], { template: round }))).toEqual(['warning:puffin']);
    expect(severities(findingsOf('seam', [motif({ x: seamPx + 60, y: 525 })], { template: round }))).toEqual(['ok:product']);
    expect(severities(findingsOf('seam', [motif({ x: 20, y: 525 })], { template: round }))).toEqual(['warning:puffin']); // the strip's ends meet
  });

  it('leaves the ends of a strip with a handle gap to the print area rule', () => {
    expect(findingsOf('seam', [motif({ x: 10, y: 525 })])).toEqual([]);
    expect(severities(findingsOf('outside-print-area', [motif({ x: 10, y: 525 })]))).toEqual(['warning:puffin']);
  });

  it('ignores hidden placements and the tiles of a repeat', () => {
    expect(findingsOf('outside-print-area', [motif({ x: 3000, hidden: true })])).toEqual([]);
    expect(findingsOf('keep-out', [repeat()], { motifs: [] })).toEqual([]);
  });
});
