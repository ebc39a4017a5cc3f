import { preflightContext, type PreflightContext } from './context';
import { paletteRule, softProofRule, transparencyRule } from './output-rules';
import { keepOutRule, outsidePrintAreaRule, safeAreaRule, seamRule } from './print-area-rules';
import { resolutionRule } from './resolution-rule';
import { quoteSourceRule, rightsRule } from './rights-rules';
import { textContrastRule, textSizeRule } from './text-rules';
import { PREFLIGHT_RULES, type Finding, type PreflightInput, type PreflightReport, type Severity } from './types';

export const preflightRules: readonly ((ctx: PreflightContext) => Finding[])[] = [
  resolutionRule, outsidePrintAreaRule, keepOutRule, seamRule, safeAreaRule, transparencyRule,
  textSizeRule, textContrastRule, rightsRule, quoteSourceRule, paletteRule, softProofRule,
];

const SEVERITY_ORDER: Record<Severity, number> = { problem: 0, warning: 1, ok: 2 };

/** Runs every rule: problems first, then warnings, then passes; within those by rule, then bottom to top. */
export function runPreflight(input: PreflightInput): PreflightReport {
  const ctx = preflightContext(input);
  const z = new Map(input.scene.layout.placements.map((p, i) => [p.id, i]));
  const findings = preflightRules
    .flatMap((rule) => rule(ctx))
    .sort(
      (a, b) =>
        SEVERITY_ORDER[a.severity] - SEVERITY_ORDER[b.severity] ||
        PREFLIGHT_RULES.indexOf(a.rule) - PREFLIGHT_RULES.indexOf(b.rule) ||
        (z.get(a.placementId ?? '') ?? -1) - (z.get(b.placementId ?? '') ?? -1) ||
        a.id.localeCompare(b.id),
    );
  return {
    findings,
    summary: {
      problems: findings.filter((f) => f.severity === 'problem').length,
      warnings: findings.filter((f) => f.severity === 'warning').length,
    },
  };
}
