import { renderPlan, type DrawRole, type Placement } from '../scene';
import { templateGeometry, type TemplateGeometry } from '../templates';
import { placedBox, type PlacedBox } from './placed-box';
import { preflightOptionsSchema, type Finding, type MotifFacts, type PreflightInput, type PreflightOptions, type PreflightRule, type Severity, type TextFacts } from './types';

/** A printed copy of a placement (itself or its mirrored copy); repeat tiles are left out, a pattern fills the strip by design. */
export type PrintedBox = { placement: Placement; role: Exclude<DrawRole, 'tile'>; box: PlacedBox };

export type PreflightContext = {
  input: PreflightInput;
  geometry: TemplateGeometry;
  options: PreflightOptions;
  /** Visible placements, bottom first. */
  placements: readonly Placement[];
  printed: readonly PrintedBox[];
  motifFacts: (p: Placement) => MotifFacts | undefined;
  textFacts: (placementId: string) => TextFacts | undefined;
};

export function preflightContext(input: PreflightInput): PreflightContext {
  const geometry = templateGeometry(input.template);
  const byId = new Map(input.scene.layout.placements.map((p) => [p.id, p]));
  const plan = renderPlan(input.scene, input.template, { clip: 'none' });
  const printed: PrintedBox[] = [];
  for (const op of plan.ops) {
    const placement = byId.get(op.placementId);
    if (placement && op.role !== 'tile') printed.push({ placement, role: op.role, box: placedBox(op.matrix, op.width, op.height) });
  }
  const motifs = new Map(input.motifs.map((m) => [`${m.id}@${m.version}`, m]));
  const texts = new Map((input.texts ?? []).map((t) => [t.placementId, t]));
  return {
    input,
    geometry,
    options: preflightOptionsSchema.parse(input.options ?? {}),
    placements: input.scene.layout.placements.filter((p) => !p.hidden),
    printed,
    motifFacts: (p) => (p.type === 'text' ? undefined : motifs.get(`${p.motifId}@${p.version}`)),
    textFacts: (id) => texts.get(id),
  };
}

/** How a message names a placement: the motif's name, or the start of the text. */
export function placementLabel(ctx: PreflightContext, p: Placement, role: DrawRole = 'placement'): string {
  const name = (text: string) => (text.length > 40 ? `${text.slice(0, 39)}…` : text);
  let label: string;
  if (p.type === 'text') label = `The text “${name(p.content.trim() || 'empty')}”`;
  else {
    const motifName = ctx.motifFacts(p)?.name;
    const motif = motifName ? `“${name(motifName)}”` : 'a motif';
    label = p.type === 'repeat' ? `The pattern of ${motif}` : motifName ? motif : 'A motif';
  }
  return role === 'mirror' ? `The mirrored copy of ${label.charAt(0).toLowerCase()}${label.slice(1)}` : label;
}

export function finding(rule: PreflightRule, severity: Severity, message: string, fix: string, placementId?: string, detail?: string): Finding {
  const id = [rule, placementId ?? 'product', detail].filter(Boolean).join(':');
  return placementId === undefined ? { id, rule, severity, message, fix } : { id, rule, severity, message, fix, placementId };
}

/** A rule that found nothing to report says so once, for the product. */
export const passed = (rule: PreflightRule, message: string): Finding => finding(rule, 'ok', message, 'Nothing to do');
