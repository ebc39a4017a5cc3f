import { finding, passed, placementLabel, type PreflightContext } from './context';
import type { Finding } from './types';

/** A motif whose rights nobody has recorded cannot safely be sold. */
export function rightsRule(ctx: PreflightContext): Finding[] {
  const findings: Finding[] = [];
  let checked = 0;
  for (const p of ctx.placements) {
    if (p.type === 'text') continue;
    const facts = ctx.motifFacts(p);
    if (!facts) continue;
    checked++;
    if (facts.rightsStatus !== 'unknown') continue;
    findings.push(finding('rights', 'warning', `${placementLabel(ctx, p)} has unknown rights`, 'Record in the library whether it is your own work, licensed or in the public domain', p.id));
  }
  return findings.length || checked === 0 ? findings : [passed('rights', 'The rights of every motif are recorded')];
}

/** A quotation needs its source before the product is sold. */
export function quoteSourceRule(ctx: PreflightContext): Finding[] {
  const quotes = ctx.placements.filter((p) => p.type === 'text' && p.isQuote);
  const findings: Finding[] = [];
  for (const p of quotes) {
    if (p.type !== 'text' || p.quoteSource.trim() !== '') continue;
    findings.push(finding('quote-source', 'warning', `${placementLabel(ctx, p)} is marked as a quote but has no source`, 'Add who said or wrote it and where, and check you may use it', p.id));
  }
  return findings.length || !quotes.length ? findings : [passed('quote-source', 'Every quote has its source')];
}
