import type { Template, TemplateVariant } from './template-schema';

// Users adjust every figure here to their printer's own template: mug sizes are not standardised.

// Published imaging limit of one mug press: "1.25 in from the handle" (sublimationinstructions.com,
// coin-bank/mug-press page). We read it as measured from the handle's centre line (assumption).
const HANDLE_LIMIT_IN = 1.25;

const MUG_OUTPUT = { format: 'png', colour: 'rgb', transparency: 'keep', dpi: 300, maxFileSizeMb: 50 } as const; // 50 MB: from memory

const HANDLE_VARIANTS: TemplateVariant[] = [
  { id: 'white', name: 'All white', blank: {} },
  { id: 'black-handle', name: 'Black handle and inside', blank: { handle: '#1f2024', inside: '#1f2024' } },
  { id: 'harbour-blue-handle', name: 'Harbour blue handle and inside', blank: { handle: '#2e5e8c', inside: '#2e5e8c' } },
];

type MugFigures = {
  id: string;
  name: string;
  wrapWidthIn: number;
  wrapHeightIn: number;
  diameterIn: number;
  blankHeightIn: number;
  safeMarginIn: number;
};

/**
 * A strip centred on the mug's front, its two ends meeting in the unprinted gap around the handle:
 * handle in the middle of that gap (derived), seam at the strip's ends, and a keep-out at each end
 * wherever the strip comes closer to the handle than HANDLE_LIMIT_IN.
 */
function mugWrap(f: MugFigures): Omit<Template, 'blank' | 'variants'> {
  const gapIn = Math.PI * f.diameterIn - f.wrapWidthIn; // derived: circumference minus wrap width
  const clearanceIn = Math.max(0, HANDLE_LIMIT_IN - gapIn / 2); // derived
  const keepOuts: Template['keepOuts'] =
    clearanceIn > 0
      ? [
          { id: 'handle-left-end', label: 'Near the handle (left end)', reason: 'handle', rect: { x: 0, y: 0, width: clearanceIn, height: f.wrapHeightIn } },
          { id: 'handle-right-end', label: 'Near the handle (right end)', reason: 'handle', rect: { x: f.wrapWidthIn - clearanceIn, y: 0, width: clearanceIn, height: f.wrapHeightIn } },
        ]
      : [];
  return {
    id: f.id,
    name: f.name,
    kind: 'mug-wrap',
    unit: 'in',
    size: { width: f.wrapWidthIn, height: f.wrapHeightIn },
    dpi: 300, // published rule of thumb: 300 PPI at final size (see print-trade-facts.md)
    bleed: 0, // from memory: wraps go at the design size; the transfer paper's overhang is the printer's
    safeMargin: f.safeMarginIn,
    printArea: null,
    keepOuts,
    wrap: { diameter: f.diameterIn, height: f.blankHeightIn, handleX: f.wrapWidthIn + gapIn / 2, seamX: 0 },
    output: MUG_OUTPUT,
  };
}

export const mug11oz: Template = {
  ...mugWrap({
    id: 'mug-11oz',
    name: '11 oz ceramic mug wrap',
    wrapWidthIn: 8.5, // common practice: usual full-wrap design area 8.5–9.0 x 3.5–3.75 in
    wrapHeightIn: 3.5, // common practice (same range)
    diameterIn: 3.25, // published: ordinary mugs measured 81–82 mm (blog.xird.fi); 3.25 in as in cylinder-wrap-examples.csv
    blankHeightIn: 3.75, // from memory (3.75–3.8 in), consistent with the published 92–99 mm measurements
    safeMarginIn: 0.25, // published imaging limit of one press: 0.25 in from top and bottom (sublimationinstructions.com)
  }),
  blank: { body: '#fbfaf7', inside: '#fbfaf7', handle: '#fbfaf7', rim: '#fbfaf7' }, // our own ceramic white
  variants: [
    ...HANDLE_VARIANTS,
    // heat-changing blank: dark when cold, white when a hot drink is poured
    { id: 'heat-changing-cold', name: 'Heat-changing, cold', blank: { body: '#1c1c1f', handle: '#1c1c1f', inside: '#1c1c1f' }, hidesPrint: true },
    { id: 'heat-changing-warm', name: 'Heat-changing, warm', blank: { handle: '#1c1c1f', inside: '#1c1c1f' } },
  ],
};

export const mug15oz: Template = {
  ...mugWrap({
    id: 'mug-15oz',
    name: '15 oz ceramic mug wrap',
    wrapWidthIn: 8.5, // common practice: 8.5–9.0 x 4.0–4.25 in
    wrapHeightIn: 4, // common practice (same range)
    diameterIn: 3.45, // from memory: about 3.4–3.5 in
    blankHeightIn: 4.6, // from memory: about 4.5–4.7 in
    safeMarginIn: 0.25, // as the 11 oz (published for one press)
  }),
  blank: { body: '#fbfaf7', inside: '#fbfaf7', handle: '#fbfaf7', rim: '#fbfaf7' },
  variants: HANDLE_VARIANTS,
};

export const enamelCampMug: Template = {
  ...mugWrap({
    id: 'mug-enamel-camp',
    name: 'Enamel camp mug wrap',
    wrapWidthIn: 8.25, // from memory
    wrapHeightIn: 2.5, // from memory: below the rolled rim, above the base curve
    diameterIn: 3.35, // from memory: about 85 mm
    blankHeightIn: 3.15, // from memory: about 80 mm
    safeMarginIn: 0.25, // from memory: clear of the rolled rim
  }),
  output: { ...MUG_OUTPUT, maxFileSizeMb: 30 }, // from memory
  blank: { body: '#f5f3ed', inside: '#f5f3ed', handle: '#f5f3ed', rim: '#22364f' }, // our own enamel white, navy rim
  variants: [
    { id: 'navy-rim', name: 'Navy rim', blank: {} },
    { id: 'red-rim', name: 'Red rim', blank: { rim: '#a8322d' } },
    { id: 'green-rim', name: 'Green rim', blank: { rim: '#2f5b3e' } },
  ],
};
