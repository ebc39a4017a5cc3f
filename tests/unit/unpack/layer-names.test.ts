import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { cleanName, sourcePathOf, splitSourcePath } from '../../../server/features/originals/unpack/layer-names';
import { suggestTags } from '../../../server/features/originals/unpack/suggest-tags';
import { unpackOriginal } from '../../../server/features/originals/unpack/unpack-original';
import { rawChannel, unicodeNameBlock, writeRawPsd, type RawLayer } from './support/raw-psd';

const dir = mkdtempSync(join(tmpdir(), 'unpack-names-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function namedLayer(extra: Partial<RawLayer>, left: number): RawLayer {
  return { top: 0, left, bottom: 1, right: left + 1, channels: [0, 1, 2].map((id) => rawChannel(id, new Uint8Array([200]))), ...extra };
}

async function namesOf(layers: RawLayer[]): Promise<string[]> {
  const file = join(dir, `names-${Math.random().toString(36).slice(2)}.psd`);
  writeFileSync(file, writeRawPsd({ width: 10, height: 1, layers }));
  const result = await unpackOriginal({ filePath: file, outDir: mkdtempSync(join(dir, 'out-')), cut: 'layers' });
  return result.motifs.map((m) => m.name);
}

describe('layer names from a file', () => {
  it('reads the Unicode name when there is one, and repairs names stored as raw UTF-8', async () => {
    const names = await namesOf([
      // spec: 'luni' holds the Unicode name; the Pascal name is then only a fallback
      namedLayer({ nameBytes: Buffer.from('Fuchs', 'latin1'), additional: [unicodeNameBlock('Füchse im Wald')] }, 0),
      // no 'luni' and a Pascal name in UTF-8 (as ImageMagick writes): "Forêt" must not turn into "ForÃªt"
      namedLayer({ nameBytes: Buffer.from('Forêt', 'utf8') }, 2),
      // no 'luni' and bytes that are not UTF-8: read as Latin-1
      namedLayer({ nameBytes: Buffer.from([0x43, 0x61, 0x66, 0xe9]) }, 4),
    ]);
    expect(names).toEqual(['Füchse im Wald', 'Forêt', 'Café']);
  });

  it('returns names with markup and control characters as plain text', async () => {
    const names = await namesOf([
      namedLayer({ additional: [unicodeNameBlock('<img src=x onerror=alert(1)>\u0000\u0007 Kite\r\nstring \u202Egnirts')] }, 0),
      namedLayer({ nameBytes: Buffer.from('\u001b[31mRed\u001b[0m', 'latin1') }, 2),
      namedLayer({ nameBytes: Buffer.alloc(0) }, 4),
    ]);
    // markup stays literal text (it is escaped where it is shown); controls and the
    // right-to-left override become spaces
    expect(names).toEqual(['<img src=x onerror=alert(1)> Kite string gnirts', '[31mRed [0m', 'Unnamed layer']);
  });

  it('cleans names without losing letters, emoji or markup', () => {
    expect(cleanName('  Puffin\tLeft  ', 'x')).toBe('Puffin Left');
    expect(cleanName('Fox 🦊 & <b>', 'x')).toBe('Fox 🦊 & <b>');
    expect(cleanName('\ud800broken', 'x')).toBe('\ufffdbroken');
    expect(cleanName('\u0000\u0001', 'Unnamed layer')).toBe('Unnamed layer');
    expect(Array.from(cleanName('a'.repeat(500), 'x'))).toHaveLength(200);
  });

  it('escapes slashes inside names in the source path, and splits it back', () => {
    const path = sourcePathOf(['Puffins', 'Left/Right', 'C:\\temp']);
    expect(path).toBe('Puffins/Left\\/Right/C:\\\\temp');
    expect(splitSourcePath(path)).toEqual(['Puffins', 'Left/Right', 'C:\\temp']);
  });
});

describe('tag suggestions from layer and group names', () => {
  it('splits words, lower-cases them and drops layer-role words, numbers and single letters', () => {
    expect(suggestTags(['Layer 3 copy', 'puffinLeftWing_v2', 'Group 1', 'Picnic-Basket', 'A'])).toEqual(['puffin', 'left', 'wing', 'picnic', 'basket']);
  });

  it('keeps non-English words whole and drops duplicates', () => {
    expect(suggestTags(['Füchse im Wald', 'Wald', 'Laterne 2'])).toEqual(['füchse', 'im', 'wald', 'laterne']);
    expect(suggestTags(['HTMLTitle', 'KiteString'])).toEqual(['html', 'title', 'kite', 'string']);
    expect(suggestTags(['Little Fox with Lantern', 'Lantern Walk'])).toEqual(['little', 'fox', 'lantern', 'walk']);
  });
});
