import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { sanitiseSvg } from '../../../server/features/originals/unpack/sanitise-svg';
import { UnpackError } from '../../../server/features/originals/unpack/unpack-error';
import { unpackOriginal } from '../../../server/features/originals/unpack/unpack-original';
import { readPngRgba } from './support/pixels';
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import opentype from 'opentype.js';
import { fontFamiliesNamed, liveTextNote } from '../../../server/features/originals/unpack/svg-live-text';

const dir = mkdtempSync(join(tmpdir(), 'unpack-svg-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function svgFile(name: string, text: string): string {
  const file = join(dir, name);
  writeFileSync(file, text);
  return file;
}

async function rejection(filePath: string): Promise<string> {
  try {
    await unpackOriginal({ filePath, outDir: mkdtempSync(join(dir, 'out-')), cut: 'groups' });
    return 'ok';
  } catch (error) {
    expect(error).toBeInstanceOf(UnpackError);
    return (error as UnpackError).code;
  }
}

// Our own drawing: a sea-green square in the right half of a 1 x 0.5 in (96 x 48 px) sheet.
const SQUARE = '<svg xmlns="http://www.w3.org/2000/svg" width="96" height="48"><rect x="48" y="0" width="48" height="48" fill="#1d6f6a"/></svg>';

describe('SVG drawings', () => {
  it('become one motif drawn at 300 ppi, placed and coloured as ImageMagick draws the same file', async () => {
    const file = svgFile('square.svg', SQUARE);
    const out = mkdtempSync(join(dir, 'out-'));
    const result = await unpackOriginal({ filePath: file, outDir: out, cut: 'groups', originalName: 'Harbour square.svg' });
    // CSS Values and Units: 96 px = 1 in, so at 300 ppi the sheet is 300 x 150 px and the square
    // starts at x = 150
    expect(result.document).toMatchObject({ width: 300, height: 150, ppi: 300, colourMode: 'RGB' });
    expect(result.motifs).toHaveLength(1);
    expect(result.motifs[0]).toMatchObject({ name: 'Harbour square', left: 150, top: 0, width: 150, height: 150 });
    expect(result.report.notes[0]).toMatch(/Drawn from the SVG at 300 ppi: the drawing is 1\.00 x 0\.50 in/);
    const png = await readPngRgba(join(out, result.motifs[0].pngFile));
    expect(Array.from(png.data.subarray(0, 4))).toEqual([0x1d, 0x6f, 0x6a, 255]);
    // ImageMagick (Debian's), an independent SVG reader, at the same 300 dpi: the same sheet size,
    // the square's colour in the right half and none in the left (its own renderer outlines
    // shapes with a thin dark line, so only the interiors are compared)
    const im = execFileSync('/usr/bin/convert', ['-density', '300', file, '-depth', '8', 'rgba:-'], { maxBuffer: 16 * 1024 * 1024 });
    expect(im.length).toBe(300 * 150 * 4);
    const at = (x: number, y: number) => Array.from(im.subarray((y * 300 + x) * 4, (y * 300 + x) * 4 + 3));
    expect(at(225, 75)).toEqual([0x1d, 0x6f, 0x6a]);
    expect(at(75, 75)).not.toEqual([0x1d, 0x6f, 0x6a]);
  });

  it('leaves out scripts, event handlers, embedded HTML and links outside the drawing, and names them in the report', async () => {
    const hostile = `<?xml version="1.0"?>
<svg xmlns="http://www.w3.org/2000/svg" xmlns:xlink="http://www.w3.org/1999/xlink" width="96" height="96" onload="alert(1)">
  <script>alert(2)</script>
  <defs><circle id="dot" cx="48" cy="48" r="40" fill="#c0392b"/></defs>
  <use xlink:href="#dot" onclick="steal()"/>
  <image href="file:///etc/passwd" width="10" height="10"/>
  <image xlink:href="http://collector.invalid/pixel.png" width="10" height="10"/>
  <foreignObject width="50" height="50"><div xmlns="http://www.w3.org/1999/xhtml">&lt;b&gt;hi</div></foreignObject>
  <style>@import url(http://collector.invalid/a.css);</style>
</svg>`;
    const clean = await sanitiseSvg(hostile);
    expect(clean.svg).not.toMatch(/script|onload|onclick|foreignObject|passwd|collector|@import/i);
    // a reference inside the drawing is kept
    expect(clean.svg).toMatch(/href="#dot"/);
    const out = mkdtempSync(join(dir, 'out-'));
    const result = await unpackOriginal({ filePath: svgFile('hostile.svg', hostile), outDir: out, cut: 'groups', originalName: 'Lantern <walk> & "kite".svg' });
    expect(result.report.leftOut).toEqual(expect.arrayContaining([
      '1 script element',
      '1 foreignObject element',
      '2 event handlers (onload, onclick)',
      '2 links outside the drawing',
      '1 style sheet that loads from outside',
    ]));
    // nothing the drawing itself holds is reported as undrawable
    expect(result.report.unsupported).toEqual([]);
    // the red dot is drawn through <use>, centred on the 300 x 300 px sheet
    expect(result.motifs).toHaveLength(1);
    // markup in a name is kept as text (the client shows it escaped)
    expect(result.motifs[0].name).toBe('Lantern <walk> & "kite"');
    expect(result.report.notes.some((n) => /live text/.test(n))).toBe(false);
    const withText = await unpackOriginal({ filePath: svgFile('sign.svg', '<svg xmlns="http://www.w3.org/2000/svg" width="96" height="48"><text x="4" y="30">Tide</text></svg>'), outDir: mkdtempSync(join(dir, 'out-')), cut: 'groups' });
    expect(withText.report.notes).toContain("The drawing's live text names no typeface and is drawn in Source Sans 3. To keep the lettering exact, turn text into outlines before exporting.");
    const png = await readPngRgba(join(out, result.motifs[0].pngFile));
    const mid = ((png.height >> 1) * png.width + (png.width >> 1)) * 4;
    expect(Array.from(png.data.subarray(mid, mid + 4))).toEqual([0xc0, 0x39, 0x2b, 255]);
  });

  it('refuses entity declarations, files that are not one drawing, and drawings too large to draw', async () => {
    const laughs = '<?xml version="1.0"?><!DOCTYPE svg [<!ENTITY a "aaaaaaaaaa"><!ENTITY b "&a;&a;&a;&a;&a;&a;&a;&a;">]><svg xmlns="http://www.w3.org/2000/svg" width="10" height="10"><text>&b;</text></svg>';
    expect(await rejection(svgFile('laughs.svg', laughs))).toBe('svg.unsafe');
    expect(await rejection(svgFile('broken.svg', '<svg xmlns="http://www.w3.org/2000/svg" width="0" height="0"'))).toBe('svg.unreadable');
    // 2,000,000 px a side at 96 px/in is 20,833 in: past any pixel limit even at 1 ppi
    const huge = svgFile('huge.svg', '<svg xmlns="http://www.w3.org/2000/svg" width="2000000" height="2000000"><rect width="10" height="10"/></svg>');
    await expect(unpackOriginal({ filePath: huge, outDir: mkdtempSync(join(dir, 'out-')), cut: 'groups', limits: { maxDocumentPixels: 1_000_000 } })).rejects.toMatchObject({ code: 'image.too_large' });
  });

  it('draws a large drawing at the resolution that fits the pixel limit, and says so', async () => {
    // 20 x 10 in at 96 px/in; 300 ppi would be 6000 x 3000 px
    const file = svgFile('banner.svg', '<svg xmlns="http://www.w3.org/2000/svg" width="1920" height="960"><rect width="1920" height="960" fill="#f6f1e8"/></svg>');
    const result = await unpackOriginal({ filePath: file, outDir: mkdtempSync(join(dir, 'out-')), cut: 'groups', limits: { maxDocumentPixels: 2_000_000 } });
    expect(result.document.width * result.document.height).toBeLessThanOrEqual(2_000_000);
    expect(result.document.ppi).toBeLessThan(300);
    expect(result.report.notes.some((n) => /not 300, to stay within/.test(n))).toBe(true);
  });

  it('draws live text in the typefaces the app ships, as wide as their own outlines say', async () => {
    // opentype.js (from npm) reads the shipped WOFF files independently of the renderer: the
    // ink of "Lantern Quay" at 40 px, scaled to 300 ppi, is the width the motif must have
    const require = createRequire(import.meta.url);
    const inkWidth = (pkg: string, file: string) => {
      const bytes = readFileSync(require.resolve(`${pkg}/files/${file}`));
      const font = opentype.parse(bytes.buffer.slice(bytes.byteOffset, bytes.byteOffset + bytes.byteLength));
      const box = font.getPath('Lantern Quay', 0, 0, 40).getBoundingBox();
      return (box.x2 - box.x1) * (300 / 96);
    };
    const drawn = async (family: string) => {
      const file = svgFile(`sign-${family}.svg`, `<svg xmlns="http://www.w3.org/2000/svg" width="384" height="96"><text x="8" y="60" font-family="${family}" font-size="40" fill="#1d3b5a">Lantern Quay</text></svg>`);
      return unpackOriginal({ filePath: file, outDir: mkdtempSync(join(dir, 'out-')), cut: 'groups' });
    };
    const caveat = await drawn('Caveat');
    const sans = await drawn("'Source Sans 3', sans-serif");
    const expectedCaveat = inkWidth('@fontsource/caveat', 'caveat-latin-600-normal.woff');
    const expectedSans = inkWidth('@fontsource/source-sans-3', 'source-sans-3-latin-400-normal.woff');
    // the two typefaces differ by far more than the tolerance, so the check tells them apart
    expect(Math.abs(expectedCaveat - expectedSans) / expectedSans).toBeGreaterThan(0.1);
    expect(Math.abs(caveat.motifs[0].width - expectedCaveat) / expectedCaveat).toBeLessThan(0.03);
    expect(Math.abs(sans.motifs[0].width - expectedSans) / expectedSans).toBeLessThan(0.03);
    expect(caveat.report.notes).toContain(`The drawing's live text is drawn in this app's own "Caveat"; a weight the app does not ship takes the nearest one. To keep the lettering exact, turn text into outlines before exporting.`);
    // a typeface the app does not have falls back to Source Sans 3, and the report names it
    const other = await drawn('Harbour Grotesk');
    expect(Math.abs(other.motifs[0].width - expectedSans) / expectedSans).toBeLessThan(0.03);
    expect(other.report.notes.some((n) => n.startsWith(`The drawing's live text asks for "Harbour Grotesk", which this app does not have`))).toBe(true);
  });

  it('reads the typefaces a drawing names from attributes and CSS, without generic families', () => {
    const svg = `<svg><style>.t { font-family: "Harbour Grotesk", Fraunces, serif; }</style>
      <text font-family="'Caveat'">a</text><text style="font-size:3px;font-family:Pacifico,cursive">b</text>
      <text font-family="caveat, \u0007x">c</text></svg>`;
    expect(fontFamiliesNamed(svg).sort()).toEqual(['Caveat', 'Fraunces', 'Harbour Grotesk', 'Pacifico', 'x']);
    expect(fontFamiliesNamed('<svg><text>plain</text></svg>')).toEqual([]);
    const many = ['A1', 'B2', 'C3', 'D4'];
    expect(liveTextNote(many, true)).toMatch(/asks for "A1", "B2", "C3" and 1 more, which this app does not have/);
    expect(liveTextNote(['Fraunces'], false)).toMatch(/drawn with the fonts this server has/);
  });
});
