import { finding, passed, placementLabel, type PreflightContext } from './context';
import type { Finding } from './types';

/** PNG outputs keep transparency; where the printer wants none, transparent artwork prints on white. */
export function transparencyRule(ctx: PreflightContext): Finding[] {
  const output = ctx.input.template.output;
  if (output.transparency === 'keep') return [passed('transparency', `Transparency is kept: the printer takes ${output.format.toUpperCase()} with transparency`)];
  const findings: Finding[] = [];
  for (const p of ctx.placements) {
    const seeThrough = p.opacity < 1 || (p.type !== 'text' && ctx.motifFacts(p)?.hasTransparency === true);
    if (!seeThrough) continue;
    findings.push(
      finding(
        'transparency',
        'warning',
        `${placementLabel(ctx, p)} has transparent areas, but this printer wants a file without transparency; they will print as if on white`,
        'Put a background behind it, or check that white there is what you want',
        p.id,
      ),
    );
  }
  return findings.length ? findings : [passed('transparency', 'Nothing relies on transparency, which this printer does not take')];
}

/** The number of distinct colour groups in the design against the studio's limit. */
export function paletteRule(ctx: PreflightContext): Finding[] {
  const groups = ctx.input.paletteGroups;
  if (!groups) return [];
  const limit = ctx.options.paletteLimit;
  if (groups.length <= limit) return [passed('palette', `The design uses ${groups.length} colour ${groups.length === 1 ? 'group' : 'groups'} (limit ${limit})`)];
  return [
    finding(
      'palette',
      'warning',
      `The design uses ${groups.length} colour groups; the studio’s limit is ${limit}`,
      'Recolour some motifs to colours the design already uses, or raise the limit in the studio settings',
    ),
  ];
}

/** Reports the server's soft proof: the share of pixels moving more than ΔE00 5 through the printer's CMYK profile. */
export function softProofRule(ctx: PreflightContext): Finding[] {
  const proof = ctx.input.softProof;
  if (!proof) return [];
  const percent = proof.shareOverDeltaE5 * 100;
  const shown = percent > 0 && percent < 1 ? percent.toFixed(1) : String(Math.round(percent));
  const through = proof.profileName ? ` through ${proof.profileName}` : '';
  if (proof.shareOverDeltaE5 <= ctx.options.softProofWarnShare) {
    return [passed('soft-proof', `${shown}% of the design changes colour noticeably in print (more than ΔE00 5${through})`)];
  }
  return [
    finding(
      'soft-proof',
      'warning',
      `${shown}% of the design will look noticeably different in print (a colour change of more than ΔE00 5${through})`,
      'Turn on the print preview to see the areas; bright, saturated colours are the usual ones to adjust',
    ),
  ];
}
