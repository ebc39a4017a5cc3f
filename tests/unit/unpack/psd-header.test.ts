import { describe, expect, it } from 'vitest';
import { checkPsdHeader } from '../../../server/features/originals/unpack/psd-header';

// Field offsets, ranges and codes from Adobe's Photoshop File Formats Specification, "File
// Header Section" (copied in /work/shared/reference/psd-header.md): signature "8BPS" at 0,
// version at 4 (1 PSD, 2 PSB), channels at 12 (1-56), height at 14 and width at 18 (1-30,000;
// PSB 300,000), depth at 22 (1, 8, 16, 32), colour mode at 24 (0 Bitmap ... 9 Lab).
type Fields = { signature?: string; version?: number; channels?: number; height?: number; width?: number; depth?: number; mode?: number };

function header(fields: Fields = {}): Buffer {
  const b = Buffer.alloc(26);
  b.write(fields.signature ?? '8BPS', 0, 'latin1');
  b.writeUInt16BE(fields.version ?? 1, 4);
  b.writeUInt16BE(fields.channels ?? 3, 12);
  b.writeUInt32BE(fields.height ?? 2100, 14);
  b.writeUInt32BE(fields.width ?? 1500, 18);
  b.writeUInt16BE(fields.depth ?? 8, 22);
  b.writeUInt16BE(fields.mode ?? 3, 24);
  return b;
}

function codeOf(fields: Fields, options?: Parameters<typeof checkPsdHeader>[1]): string {
  const check = checkPsdHeader(header(fields), options);
  return check.ok ? 'ok' : check.error.code;
}

describe('PSD header check', () => {
  it('accepts an 8-bit RGB document and reads height before width', () => {
    // the spec's worked example layout (reference/psd-header.md): height at 14, width at 18
    const check = checkPsdHeader(header({ height: 30, width: 40 }));
    expect(check).toEqual({ ok: true, header: { version: 1, width: 40, height: 30, channels: 3, depth: 8, colourMode: 'RGB', colourModeCode: 3 } });
  });

  it('rejects a file shorter than the 26-byte header as truncated', () => {
    const check = checkPsdHeader(header().subarray(0, 25));
    expect(check.ok ? 'ok' : check.error.code).toBe('psd.truncated');
  });

  it('rejects a file without the 8BPS signature', () => {
    expect(codeOf({ signature: '8BPX' })).toBe('psd.bad_signature');
  });

  it('rejects versions other than 1 and 2', () => {
    expect(codeOf({ version: 3 })).toBe('psd.bad_version');
    expect(codeOf({ version: 0 })).toBe('psd.bad_version');
  });

  it('accepts a PSB (version 2) unless large-format files are switched off', () => {
    expect(codeOf({ version: 2 })).toBe('ok');
    expect(codeOf({ version: 2 }, { allowPsb: false })).toBe('psd.psb_unsupported');
  });

  it('accepts 1 to 56 channels and rejects 0 and 57', () => {
    expect(codeOf({ channels: 0 })).toBe('psd.bad_channels');
    expect(codeOf({ channels: 57 })).toBe('psd.bad_channels');
    expect(codeOf({ channels: 56 })).toBe('ok');
    // an RGB document needs its three colour channels
    expect(codeOf({ channels: 2 })).toBe('psd.bad_channels');
  });

  it('accepts sides of 1 to 30,000 pixels in a PSD and up to 300,000 in a PSB', () => {
    expect(codeOf({ width: 0 })).toBe('psd.bad_dimensions');
    expect(codeOf({ height: 0 })).toBe('psd.bad_dimensions');
    expect(codeOf({ width: 30_001 })).toBe('psd.bad_dimensions');
    expect(codeOf({ height: 30_000, width: 1 })).toBe('ok');
    expect(codeOf({ version: 2, width: 300_000, height: 1 })).toBe('ok');
    expect(codeOf({ version: 2, width: 300_001, height: 1 })).toBe('psd.bad_dimensions');
  });

  it('rejects depths the format does not have, and 16- and 32-bit files with a clear message', () => {
    expect(codeOf({ depth: 12 })).toBe('psd.bad_depth');
    const sixteen = checkPsdHeader(header({ depth: 16 }));
    expect(sixteen).toEqual({ ok: false, error: { code: 'psd.unsupported_depth', message: '16-bit PSD files are not supported yet (8 bits per channel are); save a copy as 8-bit' } });
    expect(codeOf({ depth: 32 })).toBe('psd.unsupported_depth');
  });

  it('names unsupported colour modes and asks for RGB', () => {
    const cmyk = checkPsdHeader(header({ mode: 4, channels: 4 }));
    expect(cmyk.ok).toBe(false);
    if (!cmyk.ok) {
      expect(cmyk.error.code).toBe('psd.unsupported_mode');
      expect(cmyk.error.message).toMatch(/^CMYK .*RGB/);
    }
    for (const [mode, name] of [[0, 'Bitmap'], [2, 'Indexed'], [7, 'Multichannel'], [8, 'Duotone'], [9, 'Lab']] as const) {
      const check = checkPsdHeader(header({ mode, depth: mode === 0 ? 1 : 8 }));
      expect(check.ok ? '' : check.error.message).toContain(name);
    }
    // 5 and 6 are not defined by the spec
    expect(codeOf({ mode: 5 })).toBe('psd.bad_mode');
    expect(codeOf({ mode: 6 })).toBe('psd.bad_mode');
    expect(codeOf({ mode: 1, channels: 1 })).toBe('ok');
  });

  it('rejects a document over the pixel budget from its header alone', () => {
    expect(codeOf({ width: 30_000, height: 30_000 }, { maxDocumentPixels: 144_000_000 })).toBe('psd.document_too_large');
    expect(codeOf({ width: 12_000, height: 12_000 }, { maxDocumentPixels: 144_000_000 })).toBe('ok');
  });
});
