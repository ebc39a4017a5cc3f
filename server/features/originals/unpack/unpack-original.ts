import { mkdir, open, readFile, stat } from 'node:fs/promises';
import { SNIFF_BYTES, sniffFileType } from './sniff-file-type';
import { unpackFlatImage } from './unpack-flat-image';
import { unpackSvg } from './unpack-svg';
import { UnpackError } from './unpack-error';
import { resolveUnpackLimits, type UnpackLimits } from './unpack-limits';
import { unpackPsd } from './unpack-psd';
import type { UnpackCut, UnpackedMotif, UnpackProgress, UnpackResult } from './unpack-result';

export type UnpackInput = {
  filePath: string;
  outDir: string;
  cut: UnpackCut;
  // the uploader's file name, for the motif of a flat image
  originalName?: string;
  limits?: Partial<UnpackLimits>;
};

// The unpack itself, in the calling process. The server runs it through runUnpack (a child
// process with memory and time limits); tests and benches may call it directly.
// `onMotif` hears of each motif of a layered file once its files are written.
export async function unpackOriginal(
  input: UnpackInput,
  onProgress?: (progress: UnpackProgress) => void,
  onMotif?: (motif: UnpackedMotif) => void,
): Promise<UnpackResult> {
  const limits = resolveUnpackLimits(input.limits);
  const size = await fileSize(input.filePath);
  if (size > limits.maxFileBytes) {
    throw new UnpackError('upload.too_large', `The file is ${Math.round(size / 1048576)} MB; this server accepts up to ${Math.round(limits.maxFileBytes / 1048576)} MB`);
  }
  await mkdir(input.outDir, { recursive: true });
  const head = await readHead(input.filePath);
  const type = sniffFileType(head);
  const ctx = { outDir: input.outDir, cut: input.cut, limits, originalName: input.originalName, onProgress, onMotif };
  switch (type.kind) {
    case 'psd':
    case 'psb':
      return unpackPsd(await readWhole(input.filePath), ctx);
    case 'png':
    case 'jpeg':
    case 'webp':
      return unpackFlatImage(await readWhole(input.filePath), ctx);
    case 'svg':
      return unpackSvg(await readWhole(input.filePath), ctx);
    default:
      throw new UnpackError('upload.unsupported_type', `This file is ${type.label}; upload a layered PSD, a PNG, JPEG or WebP image, or an SVG drawing`);
  }
}

async function fileSize(path: string): Promise<number> {
  try {
    return (await stat(path)).size;
  } catch {
    throw new UnpackError('upload.unreadable', 'The uploaded file could not be read');
  }
}

async function readHead(path: string): Promise<Buffer> {
  const handle = await open(path, 'r');
  try {
    const head = Buffer.alloc(SNIFF_BYTES);
    const { bytesRead } = await handle.read(head, 0, SNIFF_BYTES, 0);
    return head.subarray(0, bytesRead);
  } finally {
    await handle.close();
  }
}

async function readWhole(path: string): Promise<Buffer> {
  try {
    return await readFile(path);
  } catch {
    throw new UnpackError('upload.unreadable', 'The uploaded file could not be read');
  }
}
