import { writePsdBuffer } from 'ag-psd';
import { writeFileSync, mkdirSync } from 'node:fs';
import { unpackOriginal } from '../server/features/originals/unpack/unpack-original';
import { runUnpack } from '../server/features/originals/unpack/run-unpack';

function solid(w: number, h: number, rgba: [number, number, number, number]) {
  const data = new Uint8ClampedArray(w * h * 4);
  for (let i = 0; i < w * h; i++) data.set(rgba, i * 4);
  return { width: w, height: h, data } as unknown as ImageData;
}
const psd = {
  width: 100, height: 80,
  children: [
    { name: 'Background', left: 0, top: 0, imageData: solid(100, 80, [255, 255, 255, 255]) },
    { name: 'Puffin', opened: true, children: [
      { name: 'Body', left: 10, top: 10, imageData: solid(30, 20, [200, 100, 50, 255]) },
      { name: 'Shade', left: 20, top: 15, opacity: 0.5, blendMode: 'multiply', imageData: solid(30, 20, [100, 100, 100, 255]) },
    ] },
    { name: 'Forêt <b>x</b>\u0007', left: 50, top: 40, imageData: solid(10, 10, [0, 0, 255, 128]) },
  ],
};
mkdirSync('.scratch-unpack/out', { recursive: true });
writeFileSync('.scratch-unpack/small.psd', writePsdBuffer(psd as never));
const r1 = await unpackOriginal({ filePath: '.scratch-unpack/small.psd', outDir: '.scratch-unpack/out', cut: 'groups' });
console.log(JSON.stringify(r1, null, 1).slice(0, 3000));
console.time('child');
const r2 = await runUnpack({ filePath: '.scratch-unpack/small.psd', outDir: '.scratch-unpack/out', cut: 'layers' }, (p) => console.log(p));
console.timeEnd('child');
console.log(r2.motifs.map((m) => [m.sourcePath, m.left, m.top, m.width, m.height]), r2.resources, r2.report);
