// Test-only builders: Saltmarsh Studio motifs on the built-in templates.
import { mug11oz, type Template } from '../../templates';
import type { Placement } from '../../scene';
import { createScene } from '../../scene';
import { runPreflight } from '../run-preflight';
import type { Finding, MotifFacts, PreflightInput } from '../types';

export { motif, text, repeat } from '../../scene/test-support/fixtures';

export const facts = (init: Partial<MotifFacts> = {}): MotifFacts => ({
  id: 'm-puffin', version: 1, name: 'Puffin', width: 100, height: 50, rightsStatus: 'own_work', hasTransparency: true, ...init,
});

type Extra = Partial<Omit<PreflightInput, 'scene' | 'template'>> & { template?: Template; mirror?: boolean };

/** Runs preflight on the placements (default template: the 11 oz mug) and returns the findings of one rule. */
export function findingsOf(rule: Finding['rule'], placements: Placement[], extra: Extra = {}): Finding[] {
  const { template = mug11oz, mirror = false, ...rest } = extra;
  const scene = createScene({ version: 2, placements, mirror });
  return runPreflight({ motifs: [facts()], ...rest, scene, template }).findings.filter((f) => f.rule === rule);
}

export const severities = (findings: Finding[]) => findings.map((f) => `${f.severity}:${f.placementId ?? 'product'}`);
