// Run as a script by draw-threads.test.ts: draws one shared print canvas with a draw thread, then
// simply ends. The process must exit on its own, as the seed and the CLI scripts do.
import { drawLayers, printCanvas, setDrawThreads, warmDrawThreads } from './draw-threads';

setDrawThreads(1);
await warmDrawThreads();
const canvas = printCanvas(1200, 1000);
const image = { data: new Uint8Array(64 * 64 * 4).fill(200), width: 64, height: 64, left: 10, top: 10 };
await drawLayers(canvas, [{ kind: 'image', image, composite: { blendMode: 'normal', opacity: 1 } }]);
console.log(`drawn ${canvas.data[(20 * 1200 + 20) * 4]}`);
