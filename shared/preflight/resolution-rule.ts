import { effectivePpi } from '../scene';
import { finding, passed, placementLabel, type PreflightContext } from './context';
import type { Finding } from './types';

/**
 * Effective resolution of each motif and pattern at its placed size: the template's DPI or more is
 * fine, down to options.minimumPpi (150, common practice) a warning, below that a problem.
 */
export function resolutionRule(ctx: PreflightContext): Finding[] {
  const dpi = ctx.input.template.dpi;
  const findings: Finding[] = [];
  let checked = 0;
  for (const p of ctx.placements) {
    if (p.type === 'text') continue;
    const facts = ctx.motifFacts(p);
    if (!facts) {
      findings.push(finding('missing-motif', 'problem', `${placementLabel(ctx, p)} uses version ${p.version} of a motif that is no longer in the library`, 'Replace it with another motif, or remove it', p.id));
      continue;
    }
    checked++;
    const ppi = effectivePpi(p, { dpi }, facts) ?? Infinity;
    if (ppi >= dpi - 0.05) continue; // within rounding of the DPI
    const shown = Math.floor(ppi + 1e-6); // 1000 px over 2500/300 in is 119.999… in floats
    const shrinkTo = Math.floor((ppi / dpi) * 100);
    const fix = `Make it smaller (about ${shrinkTo}% of its current size reaches ${dpi} PPI), or use a larger version of the artwork`;
    findings.push(
      ppi >= ctx.options.minimumPpi
        ? finding('resolution', 'warning', `${placementLabel(ctx, p)} prints at ${shown} PPI, below the template’s ${dpi}; it may look soft`, fix, p.id)
        : finding('resolution', 'problem', `${placementLabel(ctx, p)} prints at ${shown} PPI, under ${ctx.options.minimumPpi}; it will look blurred or blocky`, fix, p.id),
    );
  }
  if (checked > 0 && !findings.some((f) => f.rule === 'resolution')) findings.push(passed('resolution', `Every motif prints at ${dpi} PPI or more`));
  return findings;
}
