import { createHash } from 'node:crypto';
import { existsSync, statSync } from 'node:fs';
import { mkdir, mkdtemp, readFile, rename, rm, writeFile } from 'node:fs/promises';
import { createRequire } from 'node:module';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { decompress } from 'wawoff2';
import { fontSubsets, shippedFonts } from '../../../shared/text/shipped-fonts';

// librsvg (inside sharp) draws an SVG's live text with the fonts fontconfig finds. The app's own
// typefaces ship only as WOFF/WOFF2 for the browser, which that fontconfig does not load, so they
// are unpacked once (Google's WOFF2 decoder, as wawoff2) into TrueType files in a folder of their
// own, with a fontconfig file that lists them first and makes Source Sans 3 the last resort.

// bump when the folder's content changes, so an old one is not reused
const LAYOUT_VERSION = 2;
const require = createRequire(import.meta.url);

export type SvgFontFile = { family: string; weight: number; subset: string; file: string };

// named by the font packages' versions too, so an upgrade builds a fresh folder
export function defaultSvgFontRoot(): string {
  const versions = shippedFonts.map((font) => (require(`${font.packageName}/package.json`) as { version: string }).version);
  const tag = createHash('sha256').update(`${LAYOUT_VERSION}:${versions.join(',')}`).digest('hex').slice(0, 12);
  return path.join(tmpdir(), `motifold-svg-fonts-${tag}`);
}

// Every shipped typeface at every weight the app offers, Latin and Latin Extended.
export function svgFontFiles(): (SvgFontFile & { source: string })[] {
  return shippedFonts.flatMap((font) => font.weights.flatMap((weight) => fontSubsets.map((subset) => ({
    family: font.name,
    weight,
    subset,
    file: `${font.fileStem}-${subset}-${weight}.ttf`,
    source: require.resolve(`${font.packageName}/files/${font.fileStem}-${subset}-${weight}-normal.woff2`),
  }))));
}

export function fontConfigText(root: string): string {
  const escape = (s: string) => s.replace(/&/g, '&amp;').replace(/</g, '&lt;');
  // the packages' name tables are uneven ("Source Sans 3 ExtraLight" for every weight of the
  // WOFF2 files), so each file is given its typeface's own name as it is scanned
  const names = shippedFonts.map((font) => `  <match target="scan">
    <test name="file" compare="contains"><string>/fonts/${escape(font.fileStem)}-</string></test>
    <edit name="family" mode="prepend" binding="same"><string>${escape(font.name)}</string></edit>
  </match>`).join('\n');
  return `<?xml version="1.0"?>
<fontconfig>
  <dir>${escape(path.join(root, 'fonts'))}</dir>
  <dir>/usr/share/fonts</dir>
  <dir>/usr/local/share/fonts</dir>
  <cachedir>${escape(path.join(root, 'cache'))}</cachedir>
${names}
  <match target="pattern">
    <edit name="family" mode="append_last"><string>${shippedFonts[0].name}</string></edit>
  </match>
</fontconfig>
`;
}

const built = new Map<string, Promise<string>>();

// The fontconfig file for SVG drawing, built on first use (a few tens of ms) and reused by later
// processes. Two processes building at once each write a folder of their own; one rename wins.
export function ensureSvgFontConfig(root = defaultSvgFontRoot()): Promise<string> {
  let pending = built.get(root);
  if (!pending) {
    pending = build(root);
    built.set(root, pending);
    pending.catch(() => built.delete(root));
  }
  return pending;
}

async function build(root: string): Promise<string> {
  const config = path.join(root, 'fonts.conf');
  // someone else's folder under a shared temp directory is never trusted
  if (existsSync(root) && !ownedByUs(root)) return buildPrivate(root);
  if (existsSync(config)) return config;
  await mkdir(path.dirname(root), { recursive: true });
  const staging = await mkdtemp(`${root}.building-`);
  try {
    await writeFonts(staging, root);
    try {
      await rename(staging, root);
    } catch (error) {
      // another process finished first: its folder is as good as ours, if it is ours
      if (!existsSync(config)) throw error;
      if (!ownedByUs(root)) return buildPrivate(root);
    }
    return config;
  } finally {
    await rm(staging, { recursive: true, force: true });
  }
}

// A folder only this process knows of (mkdtemp), used where it was made; rebuilt per process.
async function buildPrivate(root: string): Promise<string> {
  const dir = await mkdtemp(`${root}-own-`);
  await writeFonts(dir, dir);
  return path.join(dir, 'fonts.conf');
}

// The TrueType files and the config that names `root` as where they will be.
async function writeFonts(dir: string, root: string): Promise<void> {
  await mkdir(path.join(dir, 'fonts'));
  for (const font of svgFontFiles()) {
    const ttf = await decompress(await readFile(font.source));
    await writeFile(path.join(dir, 'fonts', font.file), ttf);
  }
  await writeFile(path.join(dir, 'fonts.conf'), fontConfigText(root));
}

// Made by this user and writable by no one else (mkdtemp makes it 0700, the rename keeps that).
function ownedByUs(dir: string): boolean {
  const info = statSync(dir);
  return (process.getuid === undefined || info.uid === process.getuid()) && (info.mode & 0o022) === 0;
}

// Points this process's fontconfig at the shipped fonts, unless the operator set a file of their
// own. Must run before the first text is drawn: fontconfig reads the setting once.
export async function useSvgFonts(): Promise<void> {
  if (process.env.FONTCONFIG_FILE) return;
  process.env.FONTCONFIG_FILE = await ensureSvgFontConfig();
}
