import { open } from 'node:fs/promises';
import sharp, { type Metadata } from 'sharp';
import { HttpError } from '../../lib/http-error';
import { SNIFF_BYTES, sniffFileType } from '../originals/unpack/sniff-file-type';

export type PhotoKind = 'jpeg' | 'png' | 'webp' | 'heic';
export type PreparedPhoto = {
  kind: PhotoKind;
  contentType: string;
  // after EXIF orientation: the way the photo is meant to be seen
  width: number;
  height: number;
  display: Buffer;
  thumb: Buffer;
};

// Longest side of the display version: sharp enough on a large screen, a fraction of a phone photo's bytes.
export const DISPLAY_MAX_PX = 2000;
export const THUMB_MAX_PX = 320;

const contentTypes: Record<PhotoKind, string> = { jpeg: 'image/jpeg', png: 'image/png', webp: 'image/webp', heic: 'image/heic' };

// sharp's prebuilt libheif reads AVIF only unless built with an HEVC decoder; ask it, do not assume.
export const heicDecodable = (sharp.format.heif?.input.fileSuffix ?? []).some((s) => s === '.heic' || s === '.heif');

// HEIF brands of ISO/IEC 23008-12 (ftyp box at byte 4); from memory.
const heicBrands = new Set(['heic', 'heix', 'heim', 'heis', 'hevc', 'hevx', 'mif1', 'msf1']);

async function readHead(filePath: string): Promise<Buffer> {
  const handle = await open(filePath, 'r');
  try {
    const buf = Buffer.alloc(SNIFF_BYTES);
    const { bytesRead } = await handle.read(buf, 0, SNIFF_BYTES, 0);
    return buf.subarray(0, bytesRead);
  } finally {
    await handle.close();
  }
}

// Told from the bytes, never from the name or the browser's MIME type.
export async function sniffPhoto(filePath: string): Promise<PhotoKind> {
  const head = await readHead(filePath);
  if (head.length >= 12 && head.toString('latin1', 4, 8) === 'ftyp' && heicBrands.has(head.toString('latin1', 8, 12))) {
    if (heicDecodable) return 'heic';
    throw new HttpError(415, 'photo.heic_unsupported', 'This server cannot read HEIC photos yet. Export the photo as JPEG (on a phone: share it as "Most compatible", or set the camera to JPEG) and upload that.');
  }
  const sniffed = sniffFileType(head);
  if (sniffed.kind === 'jpeg' || sniffed.kind === 'png' || sniffed.kind === 'webp') return sniffed.kind;
  throw new HttpError(415, 'photo.unsupported_type', `This file is ${sniffed.label}, not a photo. Upload a JPEG, PNG or WebP image.`);
}

const unreadable = () => new HttpError(415, 'photo.unreadable', 'This photo could not be read; the file may be damaged. Export it again as JPEG and upload that.');

// A display version and a thumbnail, both turned upright by EXIF orientation; the original stays as sent.
export async function preparePhoto(filePath: string, maxPixels: number): Promise<PreparedPhoto> {
  const kind = await sniffPhoto(filePath);
  const options = { limitInputPixels: maxPixels, failOn: 'error' as const };
  let meta: Metadata;
  try {
    // the header only, so a photo over the pixel limit gets its own answer below
    meta = await sharp(filePath, { limitInputPixels: false }).metadata();
  } catch {
    throw unreadable();
  }
  if (!meta.width || !meta.height) throw unreadable();
  if (meta.width * meta.height > maxPixels) {
    const mp = (n: number) => `${n >= 10e6 ? Math.round(n / 1e6) : (n / 1e6).toFixed(1)} MP`;
    throw new HttpError(413, 'photo.too_many_pixels', `This photo has ${mp(meta.width * meta.height)}; the most Motifold takes is ${mp(maxPixels)}. Export a smaller copy.`);
  }
  // EXIF orientations 5–8 turn the picture a quarter (EXIF 2.3, tag 0x0112).
  const turned = (meta.orientation ?? 1) >= 5;
  const width = turned ? meta.height : meta.width;
  const height = turned ? meta.width : meta.height;
  const inside = (max: number) => ({ width: max, height: max, fit: 'inside' as const, withoutEnlargement: true });
  try {
    // The photo is decoded once (JPEG shrink-on-load keeps that cheap); the thumbnail comes from the upright display copy.
    const display = await sharp(filePath, options).rotate().resize(inside(DISPLAY_MAX_PX)).webp({ quality: 82 }).toBuffer();
    const thumb = await sharp(display).resize(inside(THUMB_MAX_PX)).webp({ quality: 72 }).toBuffer();
    return { kind, contentType: contentTypes[kind], width, height, display, thumb };
  } catch {
    throw unreadable();
  }
}
