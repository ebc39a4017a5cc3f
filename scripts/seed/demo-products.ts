import type { ProductStage } from '../../server/db/schema/products';
import type { LayoutRecipeName } from './demo-layouts';

// Saltmarsh Studio's products and how each got to where it is (invented, CONVENTIONS.md §2).

export type DemoPerson = 'ines' | 'teodor' | 'june';
export type DemoCollectionName = 'Coastal Spring' | 'Lantern Walk';

export type DemoStageMove = { to: ProductStage; daysAgo: number; by: DemoPerson; note?: string; override?: boolean };

export type DemoProduct = {
  name: string;
  templateId: string;
  recipe: LayoutRecipeName;
  collection: DemoCollectionName;
  tags: string[];
  notes: string;
  // saves so far, so review threads can name the revision they were opened on
  revision: number;
  createdBy: DemoPerson;
  // the first entry is where the product started (from no stage); the last is where it is now
  moves: DemoStageMove[];
  variants: { name: string; sku: string | null; options: Record<string, string> }[];
};

export const demoProducts: readonly DemoProduct[] = [
  {
    name: 'Puffin Picnic card',
    templateId: 'card-5x7-front',
    recipe: 'card',
    collection: 'Coastal Spring',
    tags: ['card', 'birthday', 'bestseller'],
    notes: 'Our best-known card. Printed on 350 gsm matt board, sold singly and in packs of five.',
    revision: 4,
    createdBy: 'ines',
    moves: [
      { to: 'drafting', daysAgo: 300, by: 'ines' },
      { to: 'proofing', daysAgo: 290, by: 'teodor', note: 'Proof uploaded to the printer’s site.' },
      { to: 'sampling', daysAgo: 284, by: 'teodor' },
      { to: 'ready', daysAgo: 276, by: 'ines', override: true, note: 'Same printer and board as our earlier cards; we skip a sample for this one.' },
      { to: 'listed', daysAgo: 270, by: 'ines', note: 'Live in the shop.' },
    ],
    variants: [
      { name: 'Single card', sku: 'SM-PP-CARD-1', options: { size: '5 x 7 in' } },
      { name: 'Pack of 5', sku: 'SM-PP-CARD-5', options: { size: '5 x 7 in, pack of 5' } },
    ],
  },
  {
    name: 'Coastal Spring sticker sheet',
    templateId: 'sticker-sheet-letter',
    recipe: 'stickers',
    collection: 'Coastal Spring',
    tags: ['stickers', 'stationery'],
    notes: 'Kiss-cut sheet of five characters. Early release at the spring markets before the collection launches.',
    revision: 3,
    createdBy: 'teodor',
    moves: [
      { to: 'drafting', daysAgo: 200, by: 'teodor' },
      { to: 'proofing', daysAgo: 188, by: 'teodor' },
      { to: 'sampling', daysAgo: 180, by: 'teodor', note: 'Ordered one sheet of each vinyl.' },
      { to: 'ready', daysAgo: 162, by: 'teodor', note: 'Sample approved.' },
      { to: 'listed', daysAgo: 150, by: 'ines', note: 'Listed for the spring markets.' },
    ],
    variants: [
      { name: 'White vinyl', sku: 'SM-CS-STK-WHT', options: { templateVariantId: 'white-vinyl' } },
      { name: 'Clear vinyl', sku: 'SM-CS-STK-CLR', options: { templateVariantId: 'clear-vinyl' } },
    ],
  },
  {
    name: 'Puffin Picnic tote',
    templateId: 'tote-panel',
    recipe: 'tote',
    collection: 'Coastal Spring',
    tags: ['tote', 'bag'],
    notes: 'One-colour canvas tote. Second proof after the first sample came back soft.',
    revision: 5,
    createdBy: 'ines',
    moves: [
      { to: 'drafting', daysAgo: 120, by: 'ines' },
      { to: 'proofing', daysAgo: 96, by: 'teodor' },
      { to: 'sampling', daysAgo: 40, by: 'teodor', note: 'One natural tote ordered.' },
      { to: 'proofing', daysAgo: 29, by: 'teodor', note: 'Sample needs changes: new proof with the artwork at print size.' },
    ],
    variants: [
      { name: 'Natural canvas', sku: 'SM-PP-TOTE-NAT', options: { templateVariantId: 'natural' } },
      { name: 'Black', sku: 'SM-PP-TOTE-BLK', options: { templateVariantId: 'black' } },
    ],
  },
  {
    name: 'Puffin Picnic mug',
    templateId: 'mug-11oz',
    recipe: 'mug',
    collection: 'Coastal Spring',
    tags: ['mug', 'gift'],
    notes: 'The picnic on the front of an 11 oz mug, opposite the handle. Navy-handle blank as the main variant.',
    revision: 3,
    createdBy: 'ines',
    moves: [
      { to: 'drafting', daysAgo: 90, by: 'ines' },
      { to: 'proofing', daysAgo: 58, by: 'teodor' },
      { to: 'sampling', daysAgo: 12, by: 'teodor', note: 'June approved the proof; sample to order this week.' },
    ],
    variants: [
      { name: 'White / navy handle', sku: 'SM-PP-MUG-NVY', options: { templateVariantId: 'harbour-blue-handle' } },
      { name: 'All white', sku: 'SM-PP-MUG-WHT', options: { templateVariantId: 'white' } },
    ],
  },
  {
    name: 'Lantern Walk card',
    templateId: 'card-5x7-front',
    recipe: 'lanternCard',
    collection: 'Lantern Walk',
    tags: ['card', 'autumn'],
    notes: 'Autumn card from the Lantern Walk original. Title position still open.',
    revision: 2,
    createdBy: 'ines',
    moves: [
      { to: 'idea', daysAgo: 34, by: 'ines' },
      { to: 'drafting', daysAgo: 21, by: 'ines' },
    ],
    variants: [{ name: 'Single card', sku: 'SM-LW-CARD-1', options: { size: '5 x 7 in' } }],
  },
  {
    name: 'Lantern Walk mug',
    templateId: 'mug-11oz',
    recipe: 'lanternMug',
    collection: 'Lantern Walk',
    tags: ['mug', 'autumn'],
    notes: 'Idea: the big fox on the front, leaves falling round to the back.',
    revision: 1,
    createdBy: 'teodor',
    moves: [{ to: 'idea', daysAgo: 9, by: 'teodor', note: 'June’s idea from the shop: customers ask for an autumn mug.' }],
    variants: [],
  },
];

export const demoCollectionNotes: Record<DemoCollectionName, { notes: string; motifs: { original: string; names: string[] } }> = {
  'Coastal Spring': {
    notes: 'The puffins’ spring range: cards, a mug, a tote and stickers, launched together.',
    motifs: { original: 'Puffin Picnic', names: ['Puffin Red Jumper', 'Puffin Teal Jumper', 'Picnic basket', 'Sandwiches', 'Kite', 'Wave band', 'Clouds'] },
  },
  'Lantern Walk': {
    notes: 'Autumn: foxes with lanterns and falling leaves. In drafting.',
    motifs: { original: 'Lantern Walk', names: ['Fox with Lantern', 'Little Fox with Lantern', 'Falling leaves', 'Lantern glow', 'Moon'] },
  },
};
