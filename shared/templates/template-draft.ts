import type { BlankColours, KeepOut, Template, TemplateKind } from './template-schema';
import { parseTemplate } from './template-schema';
import type { LengthUnit } from './units';

/**
 * A studio template as the form holds it: numbers stay the text the person typed, so a
 * half-typed "0." is not lost; `templateFromDraft` turns it into a checked template.
 */
export type RectDraft = { x: string; y: string; width: string; height: string };
export type KeepOutDraft = { id: string; label: string; reason: KeepOut['reason']; rect: RectDraft };
export type VariantDraft = { id: string; name: string; body: string; handle: string; inside: string; rim: string };
export type TemplateDraft = {
  name: string;
  kind: TemplateKind;
  unit: LengthUnit;
  width: string;
  height: string;
  dpi: string;
  bleed: string;
  safeMargin: string;
  printArea: RectDraft | null;
  keepOuts: KeepOutDraft[];
  wrap: { diameter: string; height: string; handleX: string; seamX: string } | null;
  output: { format: 'png' | 'jpeg'; transparency: 'keep' | 'flatten'; maxFileSizeMb: string };
  blank: { body: string; inside: string; handle: string; rim: string };
  variants: VariantDraft[];
};

// Four decimals: 0.0001 in is 0.03 px at 300 DPI, and derived figures (a handle at half the
// circumference) would otherwise show as 9.355088062083414.
const text = (n: number | undefined) => (n === undefined ? '' : String(Number(n.toFixed(4))));
const rectDraft = (r: { x: number; y: number; width: number; height: number }): RectDraft => ({ x: text(r.x), y: text(r.y), width: text(r.width), height: text(r.height) });

export function draftFromTemplate(t: Template): TemplateDraft {
  return {
    name: t.name,
    kind: t.kind,
    unit: t.unit,
    width: text(t.size.width),
    height: text(t.size.height),
    dpi: text(t.dpi),
    bleed: text(t.bleed),
    safeMargin: text(t.safeMargin),
    printArea: t.printArea ? rectDraft(t.printArea) : null,
    keepOuts: t.keepOuts.map((k) => ({ id: k.id, label: k.label, reason: k.reason, rect: rectDraft(k.rect) })),
    wrap: t.wrap ? { diameter: text(t.wrap.diameter), height: text(t.wrap.height), handleX: text(t.wrap.handleX), seamX: text(t.wrap.seamX) } : null,
    output: { format: t.output.format, transparency: t.output.transparency, maxFileSizeMb: text(t.output.maxFileSizeMb) },
    blank: { body: t.blank.body, inside: t.blank.inside ?? '', handle: t.blank.handle ?? '', rim: t.blank.rim ?? '' },
    variants: t.variants.map((v) => ({ id: v.id, name: v.name, body: v.blank.body ?? '', handle: v.blank.handle ?? '', inside: v.blank.inside ?? '', rim: v.blank.rim ?? '' })),
  };
}

// Accepts "0,125" as well as "0.125": both are how people write decimals.
function num(value: string): number {
  const trimmed = value.trim().replace(',', '.');
  if (trimmed === '') return Number.NaN;
  return Number(trimmed);
}
const rect = (r: RectDraft) => ({ x: num(r.x), y: num(r.y), width: num(r.width), height: num(r.height) });
function colours(c: { body?: string; inside: string; handle: string; rim: string }): Partial<BlankColours> {
  const out: Partial<BlankColours> = {};
  if (c.body) out.body = c.body;
  if (c.inside) out.inside = c.inside;
  if (c.handle) out.handle = c.handle;
  if (c.rim) out.rim = c.rim;
  return out;
}

/** The draft as the API's template input (without id); numbers that do not parse become NaN and fail the schema by field. */
export function templateInputFromDraft(d: TemplateDraft) {
  const dpi = num(d.dpi);
  return {
    name: d.name.trim(),
    kind: d.kind,
    unit: d.unit,
    size: { width: num(d.width), height: num(d.height) },
    dpi,
    bleed: num(d.bleed),
    safeMargin: num(d.safeMargin),
    printArea: d.printArea ? rect(d.printArea) : null,
    keepOuts: d.keepOuts.map((k) => ({ id: k.id, label: k.label.trim(), reason: k.reason, rect: rect(k.rect) })),
    wrap: d.wrap ? { diameter: num(d.wrap.diameter), height: num(d.wrap.height), handleX: num(d.wrap.handleX), seamX: num(d.wrap.seamX) } : null,
    // the file is always tagged with the template's own DPI (the schema insists on it)
    output: { format: d.output.format, colour: 'rgb' as const, transparency: d.output.transparency, dpi, maxFileSizeMb: num(d.output.maxFileSizeMb) },
    blank: { body: d.blank.body, ...colours(d.blank) },
    variants: d.variants.map((v) => ({ id: v.id, name: v.name.trim(), blank: colours(v) })),
  };
}

export type DraftCheck = { ok: true; template: Template } | { ok: false; message: string; fields: Record<string, string> };

/** Checks a draft with the same schema the server uses; field keys are the schema's paths ("size.width"). */
export function checkDraft(d: TemplateDraft, id = 'draft'): DraftCheck {
  const parsed = parseTemplate({ ...templateInputFromDraft(d), id });
  if (parsed.ok) return { ok: true, template: parsed.template };
  return { ok: false, message: parsed.error.message, fields: parsed.error.fields };
}

/** Switching kind adds or drops the parts only one kind has (a wrap's blank geometry). */
export function withKind(d: TemplateDraft, kind: TemplateKind): TemplateDraft {
  if (kind === 'mug-wrap' && !d.wrap) {
    return { ...d, kind, wrap: { diameter: '', height: d.height, handleX: '0', seamX: '0' } };
  }
  if (kind !== 'mug-wrap' && d.wrap) return { ...d, kind, wrap: null };
  return { ...d, kind };
}
