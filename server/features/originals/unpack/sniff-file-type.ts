// File kinds are told from their first bytes, never from the name or the browser's MIME type.
// Magic numbers: PSD/PSB from the Adobe Photoshop File Formats Specification ("8BPS", version
// 1 or 2); PNG from the PNG specification (ISO/IEC 15948, section 5.2); JPEG SOI marker FF D8
// from ITU-T T.81; WebP "RIFF....WEBP" from RFC 9649; the others are the widely documented
// signatures of those formats (from memory).
export type SniffedKind = 'psd' | 'psb' | 'png' | 'jpeg' | 'webp' | 'svg' | 'unknown';
export type SniffedFileType = { kind: SniffedKind; label: string };

// enough for every signature below, including an SVG behind an XML prolog and comments
export const SNIFF_BYTES = 4096;

type Signature = { bytes: (number | null)[]; at?: number; label: string };

const otherSignatures: Signature[] = [
  { bytes: ascii('GIF87a'), label: 'a GIF image' },
  { bytes: ascii('GIF89a'), label: 'a GIF image' },
  { bytes: ascii('%PDF-'), label: 'a PDF document' },
  { bytes: ascii('%!PS'), label: 'a PostScript file' },
  { bytes: [0x50, 0x4b, 0x03, 0x04], label: 'a ZIP archive' },
  { bytes: [0x50, 0x4b, 0x05, 0x06], label: 'a ZIP archive' },
  { bytes: [0x1f, 0x8b], label: 'a gzip archive' },
  { bytes: ascii('Rar!'), label: 'a RAR archive' },
  { bytes: [0x37, 0x7a, 0xbc, 0xaf, 0x27, 0x1c], label: 'a 7z archive' },
  { bytes: [0x49, 0x49, 0x2a, 0x00], label: 'a TIFF image' },
  { bytes: [0x4d, 0x4d, 0x00, 0x2a], label: 'a TIFF image' },
  { bytes: ascii('BM'), label: 'a BMP image' },
  { bytes: [0x00, 0x00, 0x01, 0x00], label: 'an icon file' },
  { bytes: ascii('ftypheic'), at: 4, label: 'a HEIC photo' },
  { bytes: ascii('ftypheix'), at: 4, label: 'a HEIC photo' },
  { bytes: ascii('ftypmif1'), at: 4, label: 'a HEIF image' },
  { bytes: ascii('ftypavif'), at: 4, label: 'an AVIF image' },
  { bytes: ascii('ftypisom'), at: 4, label: 'an MP4 video' },
  { bytes: ascii('ftypmp42'), at: 4, label: 'an MP4 video' },
  { bytes: ascii('ftypqt  '), at: 4, label: 'a QuickTime video' },
  { bytes: [0x7f, 0x45, 0x4c, 0x46], label: 'a program (ELF executable)' },
  { bytes: ascii('MZ'), label: 'a Windows program' },
  { bytes: [0x00, 0x61, 0x73, 0x6d], label: 'a WebAssembly module' },
  { bytes: ascii('8BIM'), label: 'a Photoshop resource file, not a document' },
  { bytes: ascii('RIFF'), label: 'a RIFF media file (audio or video)' },
];

export function sniffFileType(head: Buffer): SniffedFileType {
  if (startsWith(head, ascii('8BPS'))) {
    const version = head.length >= 6 ? head.readUInt16BE(4) : 0;
    if (version === 2) return { kind: 'psb', label: 'a large-format Photoshop document (PSB)' };
    // other versions are still reported as PSD so the header check can name the problem
    return { kind: 'psd', label: 'a Photoshop document (PSD)' };
  }
  if (startsWith(head, [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a])) return { kind: 'png', label: 'a PNG image' };
  if (startsWith(head, [0xff, 0xd8, 0xff])) return { kind: 'jpeg', label: 'a JPEG image' };
  if (startsWith(head, ascii('RIFF')) && startsWith(head, ascii('WEBP'), 8)) return { kind: 'webp', label: 'a WebP image' };
  for (const signature of otherSignatures) {
    if (startsWith(head, signature.bytes, signature.at ?? 0)) return { kind: 'unknown', label: signature.label };
  }
  return sniffText(head);
}

function sniffText(head: Buffer): SniffedFileType {
  const text = decodeTextHead(head);
  if (text === null) return { kind: 'unknown', label: 'an unrecognised file' };
  const body = stripXmlProlog(text).toLowerCase();
  if (body.startsWith('<svg')) return { kind: 'svg', label: 'an SVG drawing' };
  if (body.startsWith('<!doctype html') || body.startsWith('<html')) return { kind: 'unknown', label: 'a web page (HTML)' };
  if (body.startsWith('<')) return { kind: 'unknown', label: 'an XML document' };
  if (body.startsWith('{') || body.startsWith('[')) return { kind: 'unknown', label: 'a JSON or text file' };
  return { kind: 'unknown', label: 'a text file' };
}

// null when the head does not look like text (UTF-8 with an optional BOM, no NULs)
function decodeTextHead(head: Buffer): string | null {
  const slice = head.subarray(0, SNIFF_BYTES);
  if (slice.length === 0 || slice.includes(0)) return null;
  const text = slice.toString('utf8').replace(/^\uFEFF/, '');
  const controls = text.match(/[\u0000-\u0008\u000e-\u001f]/g)?.length ?? 0;
  return controls > 0 ? null : text;
}

function stripXmlProlog(text: string): string {
  let rest = text.trimStart();
  for (let guard = 0; guard < 32; guard++) {
    const before = rest;
    rest = rest.replace(/^<\?[\s\S]*?\?>/, '').trimStart();
    rest = rest.replace(/^<!--[\s\S]*?-->/, '').trimStart();
    // a DOCTYPE may carry an internal subset in brackets, itself holding '>' characters
    rest = rest.replace(/^<!doctype\s+svg\b[^>[]*(\[[\s\S]*?\])?\s*>/i, '').trimStart();
    if (rest === before) break;
  }
  return rest;
}

function startsWith(head: Buffer, bytes: (number | null)[], at = 0): boolean {
  if (head.length < at + bytes.length) return false;
  return bytes.every((byte, i) => byte === null || head[at + i] === byte);
}

function ascii(text: string): number[] {
  return Array.from(text, (char) => char.charCodeAt(0));
}
