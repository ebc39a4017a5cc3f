import { describe, expect, it } from 'vitest';
import { facts, findingsOf, motif, severities } from './test-support/preflight-fixtures';

// 300 PPI (the template's DPI) and 150 PPI: common practice thresholds (print-trade-facts.md).
describe('effective resolution rule', () => {
  const big = facts({ width: 1000, height: 1000 });
  const placed = (scale: number) => motif({ naturalWidth: 1000, naturalHeight: 1000, scale, x: 1275, y: 525 });

  it('passes a motif at the template’s 300 DPI', () => {
    const f = findingsOf('resolution', [placed(1)], { motifs: [big] });
    expect(f).toMatchObject([{ severity: 'ok', message: 'Every motif prints at 300 PPI or more' }]);
  });

  it('warns between 150 and 300 PPI, saying how far to shrink it', () => {
    const [f] = findingsOf('resolution', [placed(1.5)], { motifs: [big] }); // 300 / 1.5 = 200 PPI
    expect(f).toMatchObject({ severity: 'warning', placementId: 'puffin', message: '“Puffin” prints at 200 PPI, below the template’s 300; it may look soft' });
    expect(f.fix).toMatch(/about 66% of its current size/);
    expect(severities(findingsOf('resolution', [placed(2)], { motifs: [big] }))).toEqual(['warning:puffin']); // exactly 150
  });

  it('calls anything under 150 PPI a problem, with a configurable floor', () => {
    expect(severities(findingsOf('resolution', [placed(2.5)], { motifs: [big] }))).toEqual(['problem:puffin']); // 120 PPI
    expect(severities(findingsOf('resolution', [placed(2.5)], { motifs: [big], options: { minimumPpi: 100 } }))).toEqual(['warning:puffin']);
  });

  it('uses the library version’s real pixels and reports a motif missing from the library', () => {
    expect(severities(findingsOf('resolution', [placed(2)], { motifs: [facts({ width: 2000, height: 2000 })] }))).toEqual(['ok:product']);
    const missing = findingsOf('missing-motif', [motif({ version: 4 })]);
    expect(missing).toMatchObject([{ severity: 'problem', placementId: 'puffin', message: expect.stringMatching(/version 4/) }]);
  });
});
