import type { PreviewView } from '../../../shared/contracts/exports';
import { blankColoursOf, printHiddenOn, type BlankColours, type Template } from '../../../shared/templates';
import { WRAP_VIEWS } from '../../../shared/wrap';
import { renderFlatPreview, renderMugPreview } from '../../lib/image/mug-preview';
import type { RgbaImage } from '../../lib/image/rgba-image';
import { badRequest } from '../../lib/http-error';

// The mug body is drawn 480 px across (then supersampled), so the print is needed at about full size.
export const PREVIEW_RENDER_SIDE = 2600;

/** Views a template can be previewed from: four sides of a wrap, or one flat view. */
export function previewViewsOf(template: Template): readonly PreviewView[] {
  return template.wrap ? WRAP_VIEWS : ['flat'];
}

/** Refuses views and variants the template does not have, before anything is rendered. */
export function assertPreviewable(template: Template, view: PreviewView, variantId: string | null): void {
  if (!previewViewsOf(template).includes(view)) {
    throw badRequest('preview.unknown_view', template.wrap ? 'Mugs are previewed from front, back, handle-left and handle-right' : 'This product has one flat preview: ask for “flat”');
  }
  if (variantId !== null && !template.variants.some((v) => v.id === variantId)) throw badRequest('preview.unknown_variant', 'This template has no variant by that name');
}

export async function productPreview(print: RgbaImage, template: Template, view: PreviewView, variantId: string | null): Promise<Buffer> {
  assertPreviewable(template, view, variantId);
  return previewOnBlank(print, template, view, blankColoursOf(template, variantId), variantId);
}

/**
 * A preview on given blank colours (a product variant's); `templateVariantId` is the template blank
 * they start from. A variant whose coating hides the print (a heat-changing blank while cold) is
 * shown without it.
 */
export async function previewOnBlank(print: RgbaImage, template: Template, view: PreviewView, blank: BlankColours, templateVariantId: string | null): Promise<Buffer> {
  if (view === 'flat') return renderFlatPreview(print, template, blank);
  return renderMugPreview(print, template, view, blank, { printHidden: printHiddenOn(template, templateVariantId) });
}
