import type { OutputSpec, Template } from './template-schema';

// Users adjust every figure here to their printer's own template.

const PAPER_WHITE = { body: '#ffffff' };
const FLATTENED_JPEG: OutputSpec = { format: 'jpeg', colour: 'rgb', transparency: 'flatten', dpi: 300, maxFileSizeMb: 25 }; // 25 MB: from memory
const FLATTENED_PNG: OutputSpec = { format: 'png', colour: 'rgb', transparency: 'flatten', dpi: 300, maxFileSizeMb: 100 }; // 100 MB: from memory
const TRANSPARENT_PNG: OutputSpec = { format: 'png', colour: 'rgb', transparency: 'keep', dpi: 300, maxFileSizeMb: 100 }; // 100 MB: from memory

export const card5x7Front: Template = {
  id: 'card-5x7-front',
  name: '5 x 7 in folded card, front panel',
  kind: 'card',
  unit: 'in',
  size: { width: 5, height: 7 }, // published: 5 x 7 in, the usual greeting-card size (print-trade-facts.md)
  dpi: 300, // published rule of thumb: 300 PPI at final size
  bleed: 0.125, // published: 1/8 in on each side
  safeMargin: 0.125, // published: 1/8 in (one printer's help page; vendors differ)
  printArea: null,
  keepOuts: [
    // from memory: keep artwork about 1/8 in clear of the crease; the fold is the panel's left edge
    { id: 'fold', label: 'Fold', reason: 'fold', rect: { x: -0.125, y: -0.125, width: 0.25, height: 7.25 } },
  ],
  wrap: null,
  output: FLATTENED_JPEG, // from memory: card printers usually ask for flattened files
  blank: PAPER_WHITE,
  variants: [],
};

export const cardA6: Template = {
  id: 'card-a6',
  name: 'A6 card',
  kind: 'card',
  unit: 'mm',
  size: { width: 105, height: 148 }, // ISO 216 A6
  dpi: 300, // published rule of thumb
  bleed: 3, // published: 3 mm on each side (metric convention)
  safeMargin: 5, // published: text about 5 mm in from the edges (one printer's page; vendors differ)
  printArea: null,
  keepOuts: [],
  wrap: null,
  output: FLATTENED_JPEG,
  blank: PAPER_WHITE,
  variants: [],
};

export const totePanel: Template = {
  id: 'tote-panel',
  name: 'Tote bag panel',
  kind: 'tote',
  unit: 'in',
  size: { width: 12, height: 14 }, // from memory: a usual print area on a standard tote
  dpi: 300, // published rule of thumb (garment printers often accept less)
  bleed: 0, // common practice: a panel print is not trimmed
  safeMargin: 0.5, // from memory: clear of seams and handle stitching
  printArea: null,
  keepOuts: [],
  wrap: null,
  output: TRANSPARENT_PNG, // common practice: garment printers print only where the file has ink
  blank: { body: '#ece2cc', handle: '#e1d3b5' }, // our own natural canvas
  variants: [
    { id: 'natural', name: 'Natural canvas', blank: {} },
    { id: 'black', name: 'Black', blank: { body: '#222225', handle: '#222225' } },
  ],
};

export const printA4: Template = {
  id: 'print-a4',
  name: 'A4 art print',
  kind: 'print',
  unit: 'mm',
  size: { width: 210, height: 297 }, // ISO 216 A4
  dpi: 300, // published rule of thumb
  bleed: 3, // published: 3 mm on each side
  safeMargin: 5, // published: about 5 mm (vendors differ)
  printArea: null,
  keepOuts: [],
  wrap: null,
  output: FLATTENED_PNG,
  blank: PAPER_WHITE,
  variants: [],
};

export const printA3: Template = {
  ...printA4,
  id: 'print-a3',
  name: 'A3 art print',
  size: { width: 297, height: 420 }, // ISO 216 A3
};

export const stickerSheet: Template = {
  id: 'sticker-sheet-letter',
  name: 'Sticker sheet, US Letter',
  kind: 'sticker-sheet',
  unit: 'in',
  size: { width: 8.5, height: 11 }, // ANSI US Letter 8.5 x 11 in (paper-sizes.csv)
  dpi: 300, // published rule of thumb
  bleed: 0, // common practice: each kiss-cut sticker carries its own bleed, not the sheet
  safeMargin: 0.25, // from memory: the cutter's margin around the sheet
  printArea: null,
  keepOuts: [],
  wrap: null,
  output: TRANSPARENT_PNG, // common practice: the cut line follows each sticker's outline (its alpha)
  blank: PAPER_WHITE,
  variants: [
    { id: 'white-vinyl', name: 'White vinyl', blank: {} },
    { id: 'clear-vinyl', name: 'Clear vinyl', blank: { body: '#e9eef0' } },
  ],
};
