import { contrastRatio, hexToRgb, parseHexColour, WCAG_THRESHOLDS } from '../colour';
import { blankColoursOf } from '../templates';
import { finding, passed, placementLabel, type PreflightContext } from './context';
import type { Finding } from './types';

// WCAG 2.x "large scale" text: at least 18 pt (14 pt bold; weight is not known here, so 18 pt).
const LARGE_TEXT_PT = 18;

const texts = (ctx: PreflightContext) => ctx.placements.filter((p) => p.type === 'text');

/** Small text at print size is hard to read and may fill in (8 pt: common practice). */
export function textSizeRule(ctx: PreflightContext): Finding[] {
  const min = ctx.options.minimumTextPt;
  const findings: Finding[] = [];
  for (const p of texts(ctx)) {
    if (p.type !== 'text' || p.sizePt >= min) continue;
    const size = Math.round(p.sizePt * 10) / 10;
    findings.push(finding('text-size', 'warning', `${placementLabel(ctx, p)} is ${size} pt at print size; below ${min} pt text is hard to read`, `Make it at least ${min} pt`, p.id));
  }
  return findings.length || !texts(ctx).length ? findings : [passed('text-size', `All text is at least ${min} pt`)];
}

/** The blank colours text is checked against: the chosen variant's, or with none chosen the plain blank's and every template or product variant's body that differs from it (where the print shows). */
function backdropsOf(ctx: PreflightContext): { body: string; variant: string | null }[] {
  const { template, variantId } = ctx.input;
  if (variantId) return [{ body: blankColoursOf(template, variantId).body, variant: null }];
  const candidates = [
    // on a cold heat-changing blank the coating hides the print, text and all
    ...template.variants.filter((v) => !v.hidesPrint).map((v) => ({ body: blankColoursOf(template, v.id).body, variant: v.name })),
    ...(ctx.input.productBlanks ?? []).map((b) => ({ body: b.body, variant: b.name })),
  ];
  const all = [{ body: template.blank.body, variant: null as string | null }];
  for (const c of candidates) {
    if (!all.some((b) => b.body.toLowerCase() === c.body.toLowerCase())) all.push(c);
  }
  return all;
}

/**
 * WCAG 2.x contrast ratio of the text colour against what lies behind it: the renderer's measured
 * backdrop when given, else the blank's body colour: the chosen variant's, or with none chosen the
 * least favourable of the blank's and its variants' (dark text on the black blank counts too).
 * 4.5:1 for normal text, 3:1 for large text (SC 1.4.3).
 */
export function textContrastRule(ctx: PreflightContext): Finding[] {
  const backdrops = backdropsOf(ctx);
  const findings: Finding[] = [];
  for (const p of texts(ctx)) {
    if (p.type !== 'text' || p.content.trim() === '') continue;
    const given = ctx.textFacts(p.id)?.backdropColour;
    const measured = given !== undefined && parseHexColour(given).ok ? given : undefined;
    const colour = hexToRgb(p.colour);
    const worst = measured
      ? { ratio: contrastRatio(colour, hexToRgb(measured)), variant: null }
      : backdrops
          .map((b) => ({ ratio: contrastRatio(colour, hexToRgb(b.body)), variant: b.variant }))
          .reduce((a, b) => (b.ratio < a.ratio ? b : a));
    const needed = p.sizePt >= LARGE_TEXT_PT ? WCAG_THRESHOLDS.aaLargeText : WCAG_THRESHOLDS.aaNormalText;
    if (worst.ratio >= needed) continue;
    const against = measured ? 'the artwork behind it' : worst.variant ? `the “${worst.variant}” blank` : 'the blank’s colour';
    findings.push(
      finding(
        'text-contrast',
        'warning',
        `${placementLabel(ctx, p)} has a contrast of ${Math.floor(worst.ratio * 100) / 100}:1 against ${against}; text this size needs ${needed}:1 to read easily`,
        worst.variant ? 'Use a text colour that reads on every blank you sell, or leave that blank out for this design' : 'Use a darker or lighter text colour, or put a shape behind the text',
        p.id,
      ),
    );
  }
  return findings.length || !texts(ctx).length ? findings : [passed('text-contrast', 'All text stands out clearly from what is behind it')];
}
