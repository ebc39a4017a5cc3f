import type { UnpackErrorCode } from './unpack-error';

// Adobe Photoshop File Formats Specification, "File Header Section" (26 bytes, big-endian):
// signature "8BPS" (0), version (4), 6 reserved bytes (6), channels (12), height (14),
// width (18), depth (22), colour mode (24). Copy of the table: shared/reference/psd-header.md.
export const PSD_HEADER_BYTES = 26;

// Spec: "Supported range is 1 to 56" channels, including alpha channels.
const MAX_CHANNELS = 56;
// Spec: height and width 1 to 30,000 for PSD; PSB up to 300,000.
const MAX_SIDE_PSD = 30_000;
const MAX_SIDE_PSB = 300_000;
// Spec: "Supported values are 1, 8, 16 and 32" bits per channel.
const VALID_DEPTHS = [1, 8, 16, 32];

// Spec colour mode codes; 5 and 6 are not defined.
export const psdColourModes: Record<number, string> = {
  0: 'Bitmap',
  1: 'Grayscale',
  2: 'Indexed',
  3: 'RGB',
  4: 'CMYK',
  7: 'Multichannel',
  8: 'Duotone',
  9: 'Lab',
};

// RGB and Grayscale at 8 bits decode exactly (checked against ImageMagick in the tests).
const SUPPORTED_MODES = [1, 3];
const SUPPORTED_DEPTH = 8;

export type PsdHeader = {
  version: 1 | 2;
  width: number;
  height: number;
  channels: number;
  depth: number;
  colourMode: string;
  colourModeCode: number;
};

export type PsdHeaderCheck =
  | { ok: true; header: PsdHeader }
  | { ok: false; error: { code: UnpackErrorCode; message: string } };

export type PsdHeaderOptions = { allowPsb?: boolean; maxDocumentPixels?: number };

export function checkPsdHeader(head: Buffer, options: PsdHeaderOptions = {}): PsdHeaderCheck {
  const { allowPsb = true, maxDocumentPixels = Number.POSITIVE_INFINITY } = options;
  if (head.length < PSD_HEADER_BYTES) {
    return fail('psd.truncated', 'The file ends inside the PSD header; it is truncated or not a PSD file');
  }
  if (head.toString('latin1', 0, 4) !== '8BPS') {
    return fail('psd.bad_signature', 'This is not a PSD file: it does not start with the PSD signature');
  }
  const version = head.readUInt16BE(4);
  if (version !== 1 && version !== 2) {
    return fail('psd.bad_version', `Unknown PSD version ${version}; only version 1 (PSD) and 2 (PSB) exist`);
  }
  if (version === 2 && !allowPsb) {
    return fail('psd.psb_unsupported', 'Large-format PSB files are not supported here; save a copy as PSD');
  }
  const channels = head.readUInt16BE(12);
  const height = head.readUInt32BE(14);
  const width = head.readUInt32BE(18);
  const depth = head.readUInt16BE(22);
  const colourModeCode = head.readUInt16BE(24);

  if (channels < 1 || channels > MAX_CHANNELS) {
    return fail('psd.bad_channels', `The PSD header declares ${channels} channels; a PSD has 1 to ${MAX_CHANNELS}`);
  }
  const maxSide = version === 1 ? MAX_SIDE_PSD : MAX_SIDE_PSB;
  if (width < 1 || height < 1 || width > maxSide || height > maxSide) {
    return fail('psd.bad_dimensions',
      `The PSD header declares ${width} x ${height} pixels; each side must be 1 to ${maxSide.toLocaleString('en-GB')}`);
  }
  if (!VALID_DEPTHS.includes(depth)) {
    return fail('psd.bad_depth', `The PSD header declares ${depth} bits per channel; a PSD has 1, 8, 16 or 32`);
  }
  const modeName = psdColourModes[colourModeCode];
  if (modeName === undefined) {
    return fail('psd.bad_mode', `The PSD header declares an unknown colour mode (${colourModeCode})`);
  }
  if (!SUPPORTED_MODES.includes(colourModeCode)) {
    return fail('psd.unsupported_mode',
      `${modeName} PSD files are not supported (RGB and Grayscale are); convert the document to RGB colour and upload it again`);
  }
  if (depth !== SUPPORTED_DEPTH) {
    return fail('psd.unsupported_depth',
      `${depth}-bit PSD files are not supported yet (8 bits per channel are); save a copy as 8-bit`);
  }
  const minChannels = colourModeCode === 3 ? 3 : 1;
  if (channels < minChannels) {
    return fail('psd.bad_channels', `An ${modeName} PSD needs at least ${minChannels} channels; this one declares ${channels}`);
  }
  if (width * height > maxDocumentPixels) {
    return fail('psd.document_too_large',
      `The document is ${width} x ${height} pixels, more than the ${formatMegapixels(maxDocumentPixels)} this server accepts`);
  }
  return {
    ok: true,
    header: { version, width, height, channels, depth, colourMode: modeName, colourModeCode },
  };
}

export function formatMegapixels(pixels: number): string {
  return `${Math.round(pixels / 1e5) / 10} megapixels`;
}

function fail(code: UnpackErrorCode, message: string): PsdHeaderCheck {
  return { ok: false, error: { code, message } };
}
