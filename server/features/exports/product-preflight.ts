import { dominantColours } from '../../../shared/colour';
import { preflightOptionsSchema, runPreflight, type MotifFacts, type PaletteGroup, type PreflightReport, type ProductBlank, type SoftProof } from '../../../shared/preflight';
import { softProof, SOFT_PROOF_DELTA_E } from '../../lib/image/soft-proof';
import { printHiddenOn } from '../../../shared/templates';
import { renderProduct, versionKey, type ProductSources } from './product-sources';
import { variantBlank } from './variant-print-files';

// Preflight looks at a render this size (longer side): enough for colour shares, fast on 2 cores.
export const PREFLIGHT_RENDER_SIDE = 1000;
// Colour groups are counted up to a little over the largest studio limit people set (a team choice).
const MAX_PALETTE_GROUPS = 16;

export type ProductPreflight = {
  report: PreflightReport;
  motifs: MotifFacts[];
  palette: PaletteGroup[];
  softProof: SoftProof & { deltaE: number; renderWidth: number; renderHeight: number };
  /** The studio's limit the palette was checked against, so the editor's live check uses the same. */
  paletteLimit: number;
  /** The product's own variants' blanks text contrast was checked against, likewise. */
  productBlanks: ProductBlank[];
};

/** The server's authoritative preflight: the shared rules fed with facts measured from the real pixels. */
export async function productPreflight(sources: ProductSources, variantId: string | null): Promise<ProductPreflight> {
  const render = await renderProduct(sources, { maxSide: PREFLIGHT_RENDER_SIDE });
  const motifs = await motifFacts(sources);
  const { width, height, data } = render.image;
  const palette = dominantColours(data, width, height, { max: MAX_PALETTE_GROUPS }).map((c) => ({ hex: c.hex, share: c.share }));
  const proof = await softProof(render.image);
  const soft: SoftProof = { shareOverDeltaE5: proof.shareOverDeltaE5, profileName: proof.profileName };
  const options = preflightOptionsSchema.parse(sources.preflightOptions);
  // the product's own variants' blanks where the print shows, for text contrast
  const productBlanks = sources.variants
    .filter((v) => !printHiddenOn(sources.template, v.options.templateVariantId ?? null))
    .map((v) => ({ name: v.name, body: variantBlank(sources.template, v).body }));
  const report = runPreflight({ scene: sources.scene, template: sources.template, motifs, variantId, paletteGroups: palette, softProof: soft, options, productBlanks });
  return { report, motifs, palette, softProof: { ...soft, deltaE: SOFT_PROOF_DELTA_E, renderWidth: width, renderHeight: height }, paletteLimit: options.paletteLimit, productBlanks };
}

async function motifFacts(sources: ProductSources): Promise<MotifFacts[]> {
  const used = new Set(sources.product.layout.placements.flatMap((p) => (p.type === 'text' ? [] : [versionKey(p.motifId, p.version)])));
  const facts: MotifFacts[] = [];
  for (const key of used) {
    const v = sources.versions.get(key);
    if (!v) continue; // the missing-motif rule reports it
    const px = await sources.loadMotif(v.motifId, v.version);
    facts.push({ id: v.motifId, version: v.version, name: v.name, width: v.width, height: v.height, rightsStatus: v.rightsStatus, hasTransparency: hasTransparency(px.data) });
  }
  return facts;
}

function hasTransparency(rgba: Uint8Array | Uint8ClampedArray): boolean {
  for (let i = 3; i < rgba.length; i += 4) if (rgba[i] !== 255) return true;
  return false;
}
