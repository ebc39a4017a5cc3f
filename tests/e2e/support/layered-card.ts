import { writePsdBuffer, type Layer } from 'ag-psd';

export type Rgba = [number, number, number, number];

export type ExpectedMotif = { name: string; offsetX: number; offsetY: number; width: number; height: number; colour: Rgba };

function solidLayer(name: string, left: number, top: number, width: number, height: number, colour: Rgba): Layer {
  const data = new Uint8ClampedArray(width * height * 4);
  for (let i = 0; i < width * height; i++) data.set(colour, i * 4);
  return { name, left, top, right: left + width, bottom: top + height, imageData: { width, height, data, colorSpace: 'srgb' } as ImageData };
}

/**
 * A small layered card (two layer groups, two loose layers, one with markup in its name),
 * written with ag-psd. `variant` shifts every colour, so two uploads in one run never share
 * pixels (the import would link those to the motifs it already has).
 */
export function layeredCard(variant: number): { psd: Buffer; motifs: ExpectedMotif[] } {
  const shade = (r: number, g: number, b: number): Rgba => [(r + variant * 7) % 256, (g + variant * 5) % 256, (b + variant * 3) % 256, 255];
  const body = shade(30, 30, 40);
  const sail = shade(200, 40, 60);
  const basket = shade(160, 110, 60);
  const wave = shade(40, 110, 170);
  const children: Layer[] = [
    { name: 'Puffins', opened: true, children: [solidLayer('Body', 20, 20, 40, 60, body), solidLayer('Beak', 50, 30, 12, 8, shade(240, 120, 30))] },
    { name: 'Kite', children: [solidLayer('Sail', 120, 10, 32, 32, sail)] },
    solidLayer('Picnic basket', 80, 100, 48, 24, basket),
    solidLayer('Wave <i>band</i>', 0, 140, 200, 20, wave),
  ];
  const psd = writePsdBuffer({ width: 200, height: 160, children }, { generateThumbnail: false });
  // Where each motif must land: a group spans the union of its layers' rectangles.
  const motifs: ExpectedMotif[] = [
    { name: 'Puffins', offsetX: 20, offsetY: 20, width: 42, height: 60, colour: body },
    { name: 'Kite', offsetX: 120, offsetY: 10, width: 32, height: 32, colour: sail },
    { name: 'Picnic basket', offsetX: 80, offsetY: 100, width: 48, height: 24, colour: basket },
    { name: 'Wave <i>band</i>', offsetX: 0, offsetY: 140, width: 200, height: 20, colour: wave },
  ];
  return { psd, motifs };
}
