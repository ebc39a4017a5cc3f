import { describe, expect, it } from 'vitest';
import { sniffFileType } from '../../../server/features/originals/unpack/sniff-file-type';

const bytes = (...parts: (string | number[])[]) => Buffer.concat(parts.map((p) => (typeof p === 'string' ? Buffer.from(p, 'latin1') : Buffer.from(p))));

describe('telling an upload by its first bytes', () => {
  it('recognises PSD and PSB by signature and version (Photoshop File Formats Specification, header)', () => {
    expect(sniffFileType(bytes('8BPS', [0, 1], [0, 0, 0, 0, 0, 0])).kind).toBe('psd');
    expect(sniffFileType(bytes('8BPS', [0, 2], [0, 0, 0, 0, 0, 0])).kind).toBe('psb');
  });

  it('recognises PNG, JPEG and WebP', () => {
    // PNG signature: ISO/IEC 15948 section 5.2; JPEG SOI: ITU-T T.81; WebP: RFC 9649 section 2
    expect(sniffFileType(bytes([0x89], 'PNG', [0x0d, 0x0a, 0x1a, 0x0a])).kind).toBe('png');
    expect(sniffFileType(bytes([0xff, 0xd8, 0xff, 0xe0])).kind).toBe('jpeg');
    expect(sniffFileType(bytes('RIFF', [1, 2, 3, 4], 'WEBPVP8 ')).kind).toBe('webp');
  });

  it('recognises SVG behind an XML prolog, comments and a doctype', () => {
    const svg = '\uFEFF<?xml version="1.0"?>\n<!-- drawn by hand -->\n<!DOCTYPE svg PUBLIC "-//W3C//DTD SVG 1.1//EN" "x">\n<svg xmlns="http://www.w3.org/2000/svg"/>';
    expect(sniffFileType(Buffer.from(svg, 'utf8'))).toEqual({ kind: 'svg', label: 'an SVG drawing' });
  });

  it('names common files it cannot import, so the refusal can say what the file is', () => {
    expect(sniffFileType(bytes('%PDF-1.7')).label).toBe('a PDF document');
    expect(sniffFileType(bytes('PK', [3, 4], 'xxxx')).label).toBe('a ZIP archive');
    expect(sniffFileType(bytes('GIF89a')).label).toBe('a GIF image');
    expect(sniffFileType(bytes('II*', [0])).label).toBe('a TIFF image');
    expect(sniffFileType(bytes([0, 0, 0, 0x18], 'ftypheic')).label).toBe('a HEIC photo');
    expect(sniffFileType(bytes('<!DOCTYPE html><html>')).label).toBe('a web page (HTML)');
    expect(sniffFileType(bytes([0, 1, 2, 3, 0xfe]))).toEqual({ kind: 'unknown', label: 'an unrecognised file' });
    expect(sniffFileType(Buffer.alloc(0)).kind).toBe('unknown');
  });

  it('does not take a RIFF file that is not WebP for an image', () => {
    expect(sniffFileType(bytes('RIFF', [1, 2, 3, 4], 'WAVEfmt ')).kind).toBe('unknown');
  });
});
