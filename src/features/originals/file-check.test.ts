import { describe, expect, it } from 'vitest';
import { checkOriginalFile, fileKindOf, formatBytes } from './file-check';

const file = (name: string, size = 1000, type = '') => ({ name, size, type });

describe('checking a file before it is uploaded as an original', () => {
  it('takes layered PSD files even when the browser gives them no type', () => {
    expect(fileKindOf(file('puffin-picnic.psd'))).toBe('psd');
    expect(checkOriginalFile(file('puffin-picnic.PSD'))).toBeNull();
  });

  it('takes flat PNG, JPEG and WebP images by extension or by type', () => {
    expect(fileKindOf(file('kite.png'))).toBe('png');
    expect(fileKindOf(file('kite.jpg'))).toBe('jpeg');
    expect(fileKindOf(file('kite', 10, 'image/webp'))).toBe('webp');
  });

  it('refuses other files, naming what they are and what is accepted', () => {
    const problem = checkOriginalFile(file('notes.txt', 10, 'text/plain'));
    expect(problem?.code).toBe('upload.unsupported_type');
    expect(problem?.message).toContain('.txt');
    expect(problem?.message).toContain('PSD');
  });

  it('takes large-document PSB files, which the server unpacks like PSD ones', () => {
    expect(checkOriginalFile(file('poster.psb'))).toBeNull();
    expect(fileKindOf({ name: 'poster.PSB', type: '' })).toBe('psd');
  });

  it('takes SVG drawings, which the server sanitises before drawing them', () => {
    expect(checkOriginalFile(file('tide-pool.svg'))).toBeNull();
    expect(fileKindOf({ name: 'drawing', type: 'image/svg+xml' })).toBe('svg');
  });

  it('refuses a file over the limit before sending a byte, and an empty one', () => {
    expect(checkOriginalFile(file('big.psd', 2049), 2048)?.code).toBe('upload.too_large');
    expect(checkOriginalFile(file('big.psd', 2048), 2048)).toBeNull();
    expect(checkOriginalFile(file('empty.png', 0))?.code).toBe('upload.empty');
  });

  it('writes sizes in binary units (1 MB = 1024 × 1024 bytes, as the server counts its limit)', () => {
    expect(formatBytes(512)).toBe('512 bytes');
    expect(formatBytes(1536)).toBe('1.5 KB');
    expect(formatBytes(1024 ** 3)).toBe('1.0 GB');
  });
});
