import type { ProductVariant } from '../../../shared/contracts/variants';
import { blankColoursOf, type BlankColours, type Template } from '../../../shared/templates';

/** One product variant as the bundle's manifest tells the printer about it. */
export type ManifestVariant = {
  id: string;
  name: string;
  sku: string | null;
  /** The print file to print for this variant. */
  printFile: string;
  /** Folder of this variant's previews in the bundle. */
  previews: string;
  /** The blank this variant is printed on (template blank, its blank variant, then the variant's own colours). */
  templateVariantId: string | null;
  blank: BlankColours;
};

/** Where a bundle's previews come from: one blank per product variant, or the template's blanks when the product has no variants. */
export type PreviewBlank = { folder: string; templateVariantId: string | null; blank: BlankColours };

export type VariantRecord = Pick<ProductVariant, 'id' | 'name' | 'sku' | 'options'>;

/** The blank a variant is printed on: the template's colours, its chosen blank variant's, then its own body and handle colours. */
export function variantBlank(template: Template, variant: VariantRecord): BlankColours {
  const base = blankColoursOf(template, variant.options.templateVariantId ?? null);
  return {
    ...base,
    ...(variant.options.blankColour ? { body: variant.options.blankColour } : {}),
    ...(variant.options.handleColour ? { handle: variant.options.handleColour } : {}),
  };
}

const safeName = (s: string) => s.replace(/[^A-Za-z0-9._-]+/g, '-').replace(/^-+|-+$/g, '').slice(0, 64);

/** A folder name per variant: its SKU (unique in a studio), else its name, made unique with a counter. */
export function variantFolders(variants: VariantRecord[]): string[] {
  const taken = new Set<string>();
  return variants.map((v, i) => {
    const base = safeName(v.sku ?? '') || safeName(v.name) || `variant-${i + 1}`;
    let name = base;
    for (let n = 2; taken.has(name.toLowerCase()); n++) name = `${base}-${n}`;
    taken.add(name.toLowerCase());
    return name;
  });
}

export function previewBlanks(template: Template, variants: VariantRecord[]): PreviewBlank[] {
  if (variants.length) {
    const folders = variantFolders(variants);
    return variants.map((v, i) => ({ folder: folders[i], templateVariantId: v.options.templateVariantId ?? null, blank: variantBlank(template, v) }));
  }
  if (template.variants.length) return template.variants.map((v) => ({ folder: v.id, templateVariantId: v.id, blank: blankColoursOf(template, v.id) }));
  return [{ folder: 'blank', templateVariantId: null, blank: template.blank }];
}

/**
 * Variants change only the blank (its colours, its size label), never the layout, so they all
 * print the same file: the manifest names, for every variant (by SKU), the one print file it
 * takes, rather than the bundle carrying identical copies.
 */
export function manifestVariants(template: Template, variants: VariantRecord[], printFile: string): ManifestVariant[] {
  const folders = variantFolders(variants);
  return variants.map((v, i) => ({
    id: v.id,
    name: v.name,
    sku: v.sku,
    printFile,
    previews: `previews/${folders[i]}/`,
    templateVariantId: v.options.templateVariantId ?? null,
    blank: variantBlank(template, v),
  }));
}

const csvCell = (s: string) => (/[",\n\r]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s);

/** The same mapping as a table a print shop can open: one row per variant (RFC 4180 quoting). */
export function variantsCsv(rows: ManifestVariant[]): string {
  const head = ['sku', 'variant', 'print_file', 'blank_body', 'blank_handle', 'previews'];
  const lines = rows.map((r) => [r.sku ?? '', r.name, r.printFile, r.blank.body, r.blank.handle ?? '', r.previews].map(csvCell).join(','));
  return [head.join(','), ...lines].join('\r\n') + '\r\n';
}
