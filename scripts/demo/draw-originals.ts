import { mkdir, writeFile } from 'node:fs/promises';
import { join, resolve } from 'node:path';
import { pathToFileURL } from 'node:url';
import { writePsdBuffer } from 'ag-psd';
import { buildDemoPsd, type DemoDocument } from './demo-layers';
import { lanternWalk } from './lantern-walk';
import { puffinPicnic } from './puffin-picnic';

// Draws Saltmarsh Studio's demo originals (invented artwork, SVG shapes of our own) as layered
// PSDs. Run: npx tsx scripts/demo/draw-originals.ts [outDir]
const originals: { name: string; fileName: string; document: () => DemoDocument }[] = [
  { name: 'Puffin Picnic', fileName: 'puffin-picnic.psd', document: puffinPicnic },
  { name: 'Lantern Walk', fileName: 'lantern-walk.psd', document: lanternWalk },
];

// options.scale < 1 draws smaller copies for tests; options.only picks originals by name
export async function drawDemoOriginals(
  outDir: string, options: { scale?: number; only?: string[] } = {},
): Promise<{ name: string; file: string }[]> {
  await mkdir(outDir, { recursive: true });
  const written: { name: string; file: string }[] = [];
  for (const original of originals) {
    if (options.only && !options.only.includes(original.name)) continue;
    const psd = await buildDemoPsd(original.document(), options.scale ?? 1);
    const file = join(outDir, original.fileName);
    await writeFile(file, writePsdBuffer(psd));
    written.push({ name: original.name, file });
  }
  return written;
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) {
  const outDir = resolve(process.argv[2] ?? 'storage/demo-originals');
  for (const { name, file } of await drawDemoOriginals(outDir)) console.log(`${name}: ${file}`);
}
