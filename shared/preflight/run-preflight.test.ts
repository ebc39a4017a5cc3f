import { describe, expect, it } from 'vitest';
import { createScene } from '../scene';
import { mug11oz } from '../templates';
import { runPreflight } from './run-preflight';
import { facts, motif, text } from './test-support/preflight-fixtures';

describe('running preflight on a mug', () => {
  const scene = createScene({
    version: 2,
    mirror: false,
    placements: [
      motif({ id: 'blurry', naturalWidth: 200, naturalHeight: 200, scale: 2.5, x: 1275, y: 525 }), // 120 PPI
      motif({ id: 'handle', x: 2450, y: 525 }),
      text({ id: 'tiny', sizePt: 6, x: 1275, y: 300, colour: '#1d2433' }),
      motif({ id: 'ghost', x: 5000, hidden: true }),
    ],
  });
  const report = runPreflight({ scene, template: mug11oz, motifs: [facts({ width: 200, height: 200 })] });

  it('lists problems first, then warnings, then passes, each rule in its order', () => {
    const order = report.findings.map((f) => f.severity);
    expect(order).toEqual([...order].sort((a, b) => ['problem', 'warning', 'ok'].indexOf(a) - ['problem', 'warning', 'ok'].indexOf(b)));
    expect(report.findings.filter((f) => f.severity === 'problem').map((f) => f.id)).toEqual(['resolution:blurry', 'keep-out:handle:handle-right-end']);
  });

  it('counts problems and warnings in the summary', () => {
    expect(report.summary).toEqual({
      problems: report.findings.filter((f) => f.severity === 'problem').length,
      warnings: report.findings.filter((f) => f.severity === 'warning').length,
    });
    expect(report.summary.problems).toBe(2);
    expect(report.findings.find((f) => f.id === 'resolution:blurry')?.message).toBe('“Puffin” prints at 120 PPI, under 150; it will look blurred or blocky');
    expect(report.findings.some((f) => f.id === 'text-size:tiny')).toBe(true);
  });

  it('says nothing about hidden placements and gives every finding its own id and a fix', () => {
    expect(report.findings.some((f) => f.placementId === 'ghost')).toBe(false);
    expect(new Set(report.findings.map((f) => f.id)).size).toBe(report.findings.length);
    expect(report.findings.every((f) => f.fix.length > 0 && f.message.length > 0)).toBe(true);
  });
});
