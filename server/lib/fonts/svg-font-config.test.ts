import { execFileSync } from 'node:child_process';
import { chmodSync, existsSync, mkdirSync, mkdtempSync, readFileSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { tmpdir } from 'node:os';
import path from 'node:path';
import opentype from 'opentype.js';
import { afterAll, describe, expect, it } from 'vitest';
import { ensureSvgFontConfig, svgFontFiles } from './svg-font-config';

const parent = mkdtempSync(path.join(tmpdir(), 'svg-fonts-test-'));
afterAll(() => rmSync(parent, { recursive: true, force: true }));
const require = createRequire(import.meta.url);
const parse = (file: string) => {
  const bytes = readFileSync(file);
  return opentype.parse(bytes.buffer.slice(bytes.byteOffset, bytes.byteOffset + bytes.byteLength));
};
const FC_LIST = '/usr/bin/fc-list';

describe('fonts for drawing SVG text', () => {
  it('unpacks every shipped typeface to TrueType with the same glyphs as its WOFF file', async () => {
    const root = path.join(parent, 'a');
    const config = await ensureSvgFontConfig(root);
    expect(config).toBe(path.join(root, 'fonts.conf'));
    const files = svgFontFiles();
    // 2 weights of Source Sans 3 and one each of the other three, Latin and Latin Extended
    expect(files).toHaveLength(10);
    for (const font of files) {
      const ttf = path.join(root, 'fonts', font.file);
      // SFNT version 0x00010000: TrueType outlines (OpenType spec, "Organization of an OpenType Font")
      expect(readFileSync(ttf).readUInt32BE(0)).toBe(0x00010000);
      // opentype.js reads the shipped WOFF (not WOFF2) on its own: the same em and the same
      // advance for each letter of the subset's sample
      const woff = parse(require.resolve(font.source.replace(/\.woff2$/, '.woff')));
      const unpacked = parse(ttf);
      expect(unpacked.unitsPerEm).toBe(woff.unitsPerEm);
      const sample = font.subset === 'latin' ? 'Lantern Quay 1–9' : 'ŁŚŻĆĘą';
      for (const char of sample) expect([char, unpacked.charToGlyph(char).advanceWidth]).toEqual([char, woff.charToGlyph(char).advanceWidth]);
    }
  });

  it('names each file by its typeface for fontconfig, as Debian\'s fc-list reads the config', async () => {
    const root = path.join(parent, 'b');
    const config = await ensureSvgFontConfig(root);
    if (!existsSync(FC_LIST)) return expect.fail(`${FC_LIST} (Debian's fontconfig) is needed for this check`);
    const listed = execFileSync(FC_LIST, ['--format', '%{file}|%{family[0]}\\n'], { env: { ...process.env, FONTCONFIG_FILE: config } }).toString('utf8');
    const familyOf = new Map(listed.trim().split('\n').map((line) => line.split('|') as [string, string]).filter(([file]) => file.startsWith(root)));
    for (const font of svgFontFiles()) expect(familyOf.get(path.join(root, 'fonts', font.file))).toBe(font.family);
  });

  it('builds once and reuses the folder, also from a second caller at the same time', async () => {
    const root = path.join(parent, 'c');
    const [first, second] = await Promise.all([ensureSvgFontConfig(root), ensureSvgFontConfig(root)]);
    expect(first).toBe(second);
    const built = statSync(first).mtimeMs;
    expect(await ensureSvgFontConfig(root)).toBe(first);
    expect(statSync(first).mtimeMs).toBe(built);
    // no staging folders are left behind
    expect(execFileSync('ls', [parent]).toString().split('\n').filter((n) => n.includes('building'))).toEqual([]);
  });

  it('does not use a folder of that name that others may write to, and builds a private one instead', async () => {
    const root = path.join(parent, 'd');
    mkdirSync(root, { mode: 0o777 });
    chmodSync(root, 0o777);
    writeFileSync(path.join(root, 'fonts.conf'), '<fontconfig><dir>/somewhere/else</dir></fontconfig>');
    const config = await ensureSvgFontConfig(root);
    expect(config).not.toBe(path.join(root, 'fonts.conf'));
    expect(readFileSync(config, 'utf8')).toContain(path.join(path.dirname(config), 'fonts'));
    expect(statSync(path.dirname(config)).mode & 0o077).toBe(0);
  });
});
