import { writePsdBuffer, type Layer } from 'ag-psd';

export type Rgba = [number, number, number, number];

export type ExpectedMotif = { name: string; offsetX: number; offsetY: number; width: number; height: number; colour: Rgba };

function solidLayer(name: string, left: number, top: number, width: number, height: number, colour: Rgba, scale: number): Layer {
  [left, top, width, height] = [left * scale, top * scale, width * scale, height * scale];
  const data = new Uint8ClampedArray(width * height * 4);
  for (let i = 0; i < width * height; i++) data.set(colour, i * 4);
  return { name, left, top, right: left + width, bottom: top + height, imageData: { width, height, data, colorSpace: 'srgb' } as ImageData };
}

/**
 * A small layered card (two layer groups, two loose layers, one with markup in its name),
 * written with ag-psd. `variant` shifts every colour, so two uploads in one run never share
 * pixels (the import would link those to the motifs it already has). `scale` multiplies every
 * size and position (200 x 160 px at 1), so an import can be made to last long enough to watch.
 */
export function layeredCard(variant: number, scale = 1): { psd: Buffer; motifs: ExpectedMotif[] } {
  const shade = (r: number, g: number, b: number): Rgba => [(r + variant * 7) % 256, (g + variant * 5) % 256, (b + variant * 3) % 256, 255];
  const body = shade(30, 30, 40);
  const sail = shade(200, 40, 60);
  const basket = shade(160, 110, 60);
  const wave = shade(40, 110, 170);
  const children: Layer[] = [
    { name: 'Puffins', opened: true, children: [solidLayer('Body', 20, 20, 40, 60, body, scale), solidLayer('Beak', 50, 30, 12, 8, shade(240, 120, 30), scale)] },
    { name: 'Kite', children: [solidLayer('Sail', 120, 10, 32, 32, sail, scale)] },
    solidLayer('Picnic basket', 80, 100, 48, 24, basket, scale),
    solidLayer('Wave <i>band</i>', 0, 140, 200, 20, wave, scale),
  ];
  const psd = writePsdBuffer({ width: 200 * scale, height: 160 * scale, children }, { generateThumbnail: false });
  // Where each motif must land: a group spans the union of its layers' rectangles.
  const at = (name: string, x: number, y: number, w: number, h: number, colour: Rgba): ExpectedMotif => ({
    name,
    offsetX: x * scale,
    offsetY: y * scale,
    width: w * scale,
    height: h * scale,
    colour,
  });
  const motifs: ExpectedMotif[] = [
    at('Puffins', 20, 20, 42, 60, body),
    at('Kite', 120, 10, 32, 32, sail),
    at('Picnic basket', 80, 100, 48, 24, basket),
    at('Wave <i>band</i>', 0, 140, 200, 20, wave),
  ];
  return { psd, motifs };
}
