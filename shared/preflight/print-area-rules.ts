import { finding, passed, placementLabel, type PreflightContext, type PrintedBox } from './context';
import { boxCoversRect, boxInsideRect, boxOverlapsRect, boxSpanX } from './placed-box';
import type { Finding } from './types';

const detailOf = (b: PrintedBox, extra?: string) => [b.role === 'mirror' ? 'mirror' : '', extra ?? ''].filter(Boolean).join(':') || undefined;

/** Cut off or not printed at all. A box covering the whole trim is a background meant to run off the edges. */
export function outsidePrintAreaRule(ctx: PreflightContext): Finding[] {
  const area = ctx.geometry.printArea;
  const findings: Finding[] = [];
  for (const b of ctx.printed) {
    if (boxInsideRect(b.box, area) || boxCoversRect(b.box, ctx.geometry.trim)) continue;
    const label = placementLabel(ctx, b.placement, b.role);
    findings.push(
      boxOverlapsRect(b.box, area)
        ? finding('outside-print-area', 'warning', `${label} runs past the print area; the part outside will be cut off`, 'Move it inside the print area, or make it smaller', b.placement.id, detailOf(b))
        : finding('outside-print-area', 'problem', `${label} lies entirely outside the print area and will not print`, 'Move it onto the print area, or remove it', b.placement.id, detailOf(b)),
    );
  }
  return findings.length || !ctx.printed.length ? findings : [passed('outside-print-area', 'Everything lies inside the print area')];
}

/** Reaching into the margin inside the trim, where cutting or the press may take it off. */
export function safeAreaRule(ctx: PreflightContext): Finding[] {
  const { safeRect, trim } = ctx.geometry;
  const findings: Finding[] = [];
  for (const b of ctx.printed) {
    if (boxInsideRect(b.box, safeRect) || boxCoversRect(b.box, trim) || !boxOverlapsRect(b.box, trim)) continue;
    findings.push(finding('safe-area', 'warning', `${placementLabel(ctx, b.placement, b.role)} reaches outside the safe area, close to the edge`, 'Move it inwards so it stays inside the safe area', b.placement.id, detailOf(b)));
  }
  return findings.length || !ctx.printed.length ? findings : [passed('safe-area', 'Everything stays inside the safe area')];
}

/** Keep-out zones: the strip near a mug's handle (a problem), a card's fold or other zones (warnings). */
export function keepOutRule(ctx: PreflightContext): Finding[] {
  if (ctx.geometry.keepOuts.length === 0) return [];
  const findings: Finding[] = [];
  for (const b of ctx.printed) {
    for (const zone of ctx.geometry.keepOuts) {
      if (!boxOverlapsRect(b.box, zone.rect)) continue;
      const label = placementLabel(ctx, b.placement, b.role);
      const id = detailOf(b, zone.id);
      if (zone.reason === 'handle') findings.push(finding('keep-out', 'problem', `${label} sits in the handle zone (${zone.label}); the handle will hide or break it`, 'Move it away from the handle', b.placement.id, id));
      else if (zone.reason === 'fold') findings.push(finding('keep-out', 'warning', `${label} crosses the fold, where the card creases`, 'Move it clear of the fold, unless it is meant to wrap round', b.placement.id, id));
      else findings.push(finding('keep-out', 'warning', `${label} sits in the keep-out zone “${zone.label}”`, 'Move it out of the zone', b.placement.id, id));
    }
  }
  return findings.length || !ctx.printed.length ? findings : [passed('keep-out', 'Nothing sits in a keep-out zone')];
}

/**
 * The seam is where a wrap's ends meet. A seam inside the strip counts; the strip's own ends count
 * only when the strip goes all the way round, since otherwise the unprinted gap lies between them
 * and the print area rule already reports artwork running off the ends.
 */
export function seamRule(ctx: PreflightContext): Finding[] {
  const wrap = ctx.geometry.wrap;
  if (!wrap) return [];
  const left = ctx.geometry.trim.x;
  const right = left + ctx.geometry.trim.width;
  const lines = wrap.seamX > left + 0.5 && wrap.seamX < right - 0.5 ? [wrap.seamX] : [];
  if (right - left >= wrap.circumferencePx - 0.5) lines.push(left, right);
  if (lines.length === 0) return [];
  const findings: Finding[] = [];
  for (const b of ctx.printed) {
    const { min, max } = boxSpanX(b.box);
    if (!lines.some((x) => min < x - 0.5 && max > x + 0.5)) continue;
    findings.push(finding('seam', 'warning', `${placementLabel(ctx, b.placement, b.role)} crosses the wrap’s seam, where the two ends of the print meet; it may not line up there`, 'Move it off the seam', b.placement.id, detailOf(b)));
  }
  return findings.length || !ctx.printed.length ? findings : [passed('seam', 'Nothing crosses the wrap’s seam')];
}
