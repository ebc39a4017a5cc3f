import { softProof } from '../../lib/image/soft-proof';
import { softProofPng } from '../../lib/image/soft-proof-image';
import { renderProduct, type ProductSources } from './product-sources';

/** The soft-proofed design at display size (longer side `side` px), optionally with moved colours striped. */
export async function productSoftProofPng(sources: ProductSources, options: { side: number; mask: boolean }): Promise<{ png: Buffer; width: number; height: number; share: number; profileName: string }> {
  const render = await renderProduct(sources, { maxSide: options.side });
  const proof = await softProof(render.image);
  const png = await softProofPng(render.image, proof, { mask: options.mask });
  return { png, width: proof.width, height: proof.height, share: proof.shareOverDeltaE5, profileName: proof.profileName };
}
