// The export tests' product: the small card PSD imported, and an 11 oz mug with its kite on the
// front centre (x 1275 of 2550), so a known colour sits at a known print-file pixel.
import { expect } from 'vitest';
import { mug11oz } from '../../../shared/templates/built-in-templates';
import { smallCardPsd } from './psd-files';
import type { ApiClient } from './test-app';
import { waitForImport } from './wait-for';

export type ImportedMotif = { id: string; name: string; width: number; height: number; version: number };

export const motifPlacement = (m: ImportedMotif, id: string, x: number, y: number, extra: object = {}) => ({
  type: 'motif', id, motifId: m.id, version: m.version, naturalWidth: m.width, naturalHeight: m.height,
  x, y, scale: 10, rotationDeg: 0, flipX: false, flipY: false, opacity: 1, blendMode: 'normal', locked: false, hidden: false, ...extra,
});

/** Imports the card with the kite in `kiteColour`, makes the mug and saves its layout: the kite, then `more` of the card's motifs. */
export async function kiteMug(owner: ApiClient, kiteColour: [number, number, number, number], more: (motifs: ImportedMotif[]) => object[] = () => []) {
  const upload = await owner.upload('/api/originals', smallCardPsd({ kiteColour }), 'puffin-picnic.psd');
  const motifs = (await waitForImport(owner, upload.body.id)).motifs as ImportedMotif[];
  const kite = motifs.find((m) => m.name === 'Kite')!;
  const created = await owner.post('/api/products', { name: 'Coastal Spring mug', templateId: mug11oz.id });
  const layout = { version: 2, mirror: false, placements: [motifPlacement(kite, 'kite', 1275, 525), ...more(motifs)] };
  expect((await owner.patch(`/api/products/${created.body.id}`, { revision: created.body.revision, layout })).status).toBe(200);
  return { productId: created.body.id as string, kite, motifs };
}
