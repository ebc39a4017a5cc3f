import { describe, expect, it } from 'vitest';
import type { ProductPreflightView } from '@shared/contracts/exports';
import { layoutOf, motif } from '@shared/scene/test-support/fixtures';
import { mug11oz } from '@shared/templates';
import { livePreflight } from './live-preflight';

const server = (init: Partial<ProductPreflightView> = {}): ProductPreflightView => ({
  report: { findings: [], summary: { problems: 0, warnings: 0 } },
  motifs: [],
  palette: [{ hex: '#1d6f6a', share: 1 }],
  softProof: { shareOverDeltaE5: 0, profileName: 'ISO Coated v2 300% (FOGRA39)', deltaE: 5, renderWidth: 1000, renderHeight: 412 },
  paletteLimit: 6,
  productBlanks: [],
  ...init,
});

const puffinFacts = { id: 'm-puffin', version: 1, name: 'Puffin', width: 100, height: 50, rightsStatus: 'unknown' as const, hasTransparency: true };

describe('the editor’s live preflight', () => {
  it('checks a motif placed since the last save by its own size, without calling it missing', () => {
    // 100 px shown 2.5 times larger: 120 PPI on a 300 DPI template, under the 150 PPI floor
    const layout = layoutOf(motif({ id: 'new', motifId: 'm-new', naturalWidth: 100, naturalHeight: 50, scale: 2.5, x: 1275, y: 525 }));
    const report = livePreflight(layout, mug11oz, server());
    expect(report.findings.some((f) => f.rule === 'missing-motif')).toBe(false);
    expect(report.findings.filter((f) => f.rule === 'resolution').map((f) => `${f.severity}:${f.placementId}`)).toEqual(['problem:new']);
    expect(report.pendingPlacements).toEqual(['new']);
  });

  it('takes rights from the server’s facts and re-runs on each layout', () => {
    const placed = motif({ id: 'p1', motifId: 'm-puffin', version: 1, naturalWidth: 100, naturalHeight: 50, x: 1275, y: 525 });
    const facts = server({ motifs: [puffinFacts] });
    const first = livePreflight(layoutOf(placed), mug11oz, facts);
    expect(first.findings.find((f) => f.rule === 'rights')?.placementId).toBe('p1');
    expect(first.pendingPlacements).toEqual([]);
    // moved across the seam at the strip's left end: the same rules see it at once
    const moved = livePreflight(layoutOf({ ...placed, x: 10 }), mug11oz, facts);
    expect(moved.findings.some((f) => f.placementId === 'p1' && f.severity !== 'ok' && (f.rule === 'outside-print-area' || f.rule === 'seam'))).toBe(true);
  });

  it('counts colour groups against the studio’s own limit, as the server did', () => {
    const placed = motif({ id: 'p1', motifId: 'm-puffin', version: 1, naturalWidth: 100, naturalHeight: 50, x: 1275, y: 525 });
    const palette = ['#1d6f6a', '#f6f1e8', '#c4462b', '#20324f'].map((hex) => ({ hex, share: 0.25 }));
    const palettes = (limit: number) => livePreflight(layoutOf(placed), mug11oz, server({ motifs: [puffinFacts], palette, paletteLimit: limit })).findings.filter((f) => f.rule === 'palette');
    expect(palettes(3).map((f) => f.severity)).toEqual(['warning']);
    expect(palettes(6).map((f) => f.severity)).toEqual(['ok']);
  });

  it('keeps a motif the server found missing as a problem', () => {
    const gone = motif({ id: 'g', motifId: 'm-gone', version: 3, x: 1275, y: 525 });
    const facts = server({ report: { findings: [{ id: 'missing-motif:g', rule: 'missing-motif', severity: 'problem', message: 'gone', fix: 'replace', placementId: 'g' }], summary: { problems: 1, warnings: 0 } } });
    const report = livePreflight(layoutOf(gone), mug11oz, facts);
    expect(report.findings.filter((f) => f.rule === 'missing-motif').map((f) => f.placementId)).toEqual(['g']);
    expect(report.summary.problems).toBeGreaterThanOrEqual(1);
  });

  it('adds the palette and soft proof measured by the server, and leaves them out before it answers', () => {
    const layout = layoutOf(motif({ id: 'p1', motifId: 'm-puffin', x: 1275, y: 525 }));
    const measured = livePreflight(layout, mug11oz, server({ motifs: [puffinFacts], softProof: { shareOverDeltaE5: 0.3, profileName: 'FOGRA39', deltaE: 5, renderWidth: 1, renderHeight: 1 } }));
    expect(measured.findings.find((f) => f.rule === 'soft-proof')?.severity).toBe('warning');
    expect(measured.findings.find((f) => f.rule === 'palette')?.severity).toBe('ok');
    const before = livePreflight(layout, mug11oz, undefined);
    expect(before.findings.some((f) => f.rule === 'soft-proof' || f.rule === 'palette')).toBe(false);
  });
});
