import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import opentype from 'opentype.js';
import type { FontStack } from './outline-font';
import { fontFilesOf } from './shipped-fonts';

const require = createRequire(import.meta.url);

/** For tests: the shipped WOFF files of a font id, parsed by opentype.js. */
export function loadTestFontStack(fontId: string): FontStack {
  return fontFilesOf(fontId).map((file) => {
    const bytes = readFileSync(require.resolve(file.path));
    return opentype.parse(bytes.buffer.slice(bytes.byteOffset, bytes.byteOffset + bytes.byteLength));
  }) as unknown as FontStack;
}
