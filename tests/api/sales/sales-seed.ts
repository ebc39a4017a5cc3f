import type { Database } from '../../../server/db/client';
import { productMotifs, products, productVariants } from '../../../server/db/schema/index';
import { createMotifPlacement, createTextPlacement, emptyLayout, type Layout } from '../../../shared/scene';
import { seedMotifs } from '../support/library-seed';

export type SalesCatalogue = { motifs: { puffin: string; kite: string; wave: string }; mugId: string; toteId: string };

// The hand-worked example of shared/sales/roll-up.test.ts, as rows of a studio:
// mug: puffin 100×200 at scale 2 (80,000 px²), kite 50×50 at scale 2 and 1 (12,500 px²), a title, a hidden wave;
// tote: wave 400×100 at scale 1 (40,000 px²), puffin at scale 1 turned 90° (20,000 px²).
export async function seedSalesCatalogue(db: Database, studioId: string): Promise<SalesCatalogue> {
  const { motifIds } = await seedMotifs(db, studioId, [
    { name: 'Puffin in a jumper', width: 100, height: 200 },
    { name: 'Kite', width: 50, height: 50 },
    { name: 'Wave band', width: 400, height: 100 },
  ]);
  const [puffin, kite, wave] = motifIds;
  const m = (id: string, motifId: string, w: number, h: number, extra: { scale?: number; rotationDeg?: number; hidden?: boolean } = {}) =>
    createMotifPlacement({ id, motifId, version: 1, naturalWidth: w, naturalHeight: h, x: 500, y: 400, ...extra });
  const mugLayout: Layout = {
    ...emptyLayout,
    placements: [
      m('a', puffin, 100, 200, { scale: 2 }),
      m('b', kite, 50, 50, { scale: 2 }),
      m('c', kite, 50, 50),
      createTextPlacement({ id: 't', content: 'Puffin Picnic', fontId: 'source-sans-3', sizePt: 24, boxWidth: 400, boxHeight: 100, x: 900, y: 300 }),
      m('d', wave, 400, 100, { hidden: true }),
    ],
  };
  const toteLayout: Layout = { ...emptyLayout, placements: [m('a', wave, 400, 100), m('b', puffin, 100, 200, { rotationDeg: 90 })] };
  const [mug, tote] = await db
    .insert(products)
    .values([
      { studioId, name: 'Puffin Picnic mug', templateId: 'mug-11oz', layout: mugLayout, stage: 'listed' },
      { studioId, name: 'Wave tote', templateId: 'tote-panel', layout: toteLayout, stage: 'listed' },
    ])
    .returning({ id: products.id });
  const uses = (productId: string, layout: Layout) =>
    layout.placements.flatMap((p) => (p.type === 'motif' ? [{ productId, motifId: p.motifId, placementId: p.id, version: 1 }] : []));
  await db.insert(productMotifs).values([...uses(mug.id, mugLayout), ...uses(tote.id, toteLayout)]);
  await db.insert(productVariants).values([
    { studioId, productId: mug.id, name: 'Blue handle', sku: 'MUG-BLUE', position: 0 },
    { studioId, productId: mug.id, name: 'White handle', sku: 'MUG-WHITE', position: 1 },
    { studioId, productId: tote.id, name: 'Natural', sku: 'TOTE-01', position: 0 },
  ]);
  return { motifs: { puffin, kite, wave }, mugId: mug.id, toteId: tote.id };
}

export const shopHeader = 'Order,Sold on,Item code,Qty,Total,Currency';
export const shopMapping = { orderId: 'Order', date: 'Sold on', sku: 'Item code', quantity: 'Qty', revenue: 'Total', currency: 'Currency', dateFormat: 'dmy', decimalSeparator: '.', delimiter: ',' };
export const csv = (...lines: string[]) => Buffer.from(`${[shopHeader, ...lines].join('\n')}\n`);
