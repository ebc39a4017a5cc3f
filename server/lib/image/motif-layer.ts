import sharp from 'sharp';
import { compose, scale, type Affine, type Rect } from '../../../shared/geometry';
import type { MotifDrawOp } from '../../../shared/scene';
import { drawTransformed, shrinkFactor, type SourcePixels } from './affine-sample';
import type { CompositeOptions } from './composite-rgba';
import { drawPreparedMotif, type PreparedMotif } from './draw-bands';
import type { RgbaImage } from './rgba-image';

export { drawPreparedMotif, type PreparedMotif } from './draw-bands';

// Below this the bilinear sampler would skip source pixels (aliasing); the motif is first
// reduced with a Lanczos filter, as a downscaled bitmap drawn through compose(scale(k), matrix).
const PRE_REDUCE_BELOW = 0.75;

type Placed = Pick<MotifDrawOp, 'matrix' | 'width' | 'height'>;

/** The plan's matrix starts from the motif's natural size, whatever size the PNG really is. */
const pixelMatrix = (source: SourcePixels, op: Placed) => compose(scale(op.width / source.width, op.height / source.height), op.matrix);

/** The reduced size when the op shrinks the source below PRE_REDUCE_BELOW, else null. */
function reducedSize(source: SourcePixels, matrix: Affine): { width: number; height: number } | null {
  const k = shrinkFactor(matrix);
  if (k >= PRE_REDUCE_BELOW) return null;
  return { width: Math.max(1, Math.round(source.width * k)), height: Math.max(1, Math.round(source.height * k)) };
}

/**
 * The sharp half of drawing a motif (the Lanczos pre-reduce, on libvips' threads). The print
 * renderer starts it for the ops ahead, so it runs while JS composites the op before.
 */
export const prepareMotif = (source: SourcePixels, op: Placed): Promise<PreparedMotif> => samplingSource(source, op);

/** Prepares and draws one motif (large reductions go through sharp's Lanczos filter first). */
export async function drawMotifOnto(canvas: RgbaImage, source: SourcePixels, op: Placed, clip: Rect, composite: CompositeOptions): Promise<void> {
  drawPreparedMotif(canvas, await prepareMotif(source, op), clip, composite);
}

/** The same motif as a layer of template pixels inside `clip` (same box and samples), for callers that composite it themselves. */
export async function motifLayer(source: SourcePixels, op: Placed, clip: Rect): Promise<RgbaImage | null> {
  const { pixels, matrix } = await samplingSource(source, op);
  return drawTransformed(pixels, matrix, clip);
}

/** The pixels to sample and their matrix: the source itself, or its Lanczos reduction when the op shrinks it a lot. */
async function samplingSource(source: SourcePixels, op: Placed): Promise<PreparedMotif> {
  const matrix = pixelMatrix(source, op);
  const reduced = reducedSize(source, matrix);
  if (!reduced) return { pixels: source, matrix };
  const { data } = await sharp(Buffer.from(source.data.buffer, source.data.byteOffset, source.data.byteLength), { raw: { width: source.width, height: source.height, channels: 4 } })
    .resize(reduced.width, reduced.height, { fit: 'fill', kernel: 'lanczos3' })
    .raw()
    .toBuffer({ resolveWithObject: true });
  return { pixels: { data, ...reduced }, matrix: compose(scale(source.width / reduced.width, source.height / reduced.height), matrix) };
}
