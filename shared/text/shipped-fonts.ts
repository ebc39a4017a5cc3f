// The typefaces shipped with the app, all under the SIL Open Font License 1.1 (their @fontsource
// packages say so), which allows embedding them as outlines in sold products.

export type ShippedFont = {
  id: string;
  name: string;
  /** How the artist would describe it in the font menu. */
  character: string;
  /** The @fontsource package and the file stem inside its files/ folder. */
  packageName: string;
  fileStem: string;
  weights: readonly number[];
  defaultWeight: number;
};

export const shippedFonts: readonly ShippedFont[] = [
  { id: 'source-sans-3', name: 'Source Sans 3', character: 'plain sans serif', packageName: '@fontsource/source-sans-3', fileStem: 'source-sans-3', weights: [400, 700], defaultWeight: 400 },
  { id: 'fraunces', name: 'Fraunces', character: 'soft display serif', packageName: '@fontsource/fraunces', fileStem: 'fraunces', weights: [600], defaultWeight: 600 },
  { id: 'caveat', name: 'Caveat', character: 'handwriting', packageName: '@fontsource/caveat', fileStem: 'caveat', weights: [600], defaultWeight: 600 },
  { id: 'pacifico', name: 'Pacifico', character: 'brush script', packageName: '@fontsource/pacifico', fileStem: 'pacifico', weights: [400], defaultWeight: 400 },
];

// Latin first, then Latin Extended for the letters of names like "Łucja" or "Şule".
export const fontSubsets = ['latin', 'latin-ext'] as const;

export type FontFile = { key: string; font: ShippedFont; weight: number; subset: (typeof fontSubsets)[number]; path: string };

/**
 * A placement's font id is a shipped font's id, optionally with a weight ("source-sans-3-700").
 * Unknown ids fall back to Source Sans 3, so an old or hand-edited layout still draws.
 */
export function resolveFontId(fontId: string): { font: ShippedFont; weight: number } {
  const weighted = /^(.*)-(\d{3})$/.exec(fontId);
  const baseId = weighted && shippedFonts.some((f) => f.id === weighted[1]) ? weighted[1] : fontId;
  const font = shippedFonts.find((f) => f.id === baseId) ?? shippedFonts[0];
  const asked = weighted ? Number(weighted[2]) : font.defaultWeight;
  const weight = font.weights.includes(asked) ? asked : font.defaultWeight;
  return { font, weight };
}

/** The WOFF files (opentype.js reads WOFF, not WOFF2) of a font id, by package path. */
export function fontFilesOf(fontId: string): FontFile[] {
  const { font, weight } = resolveFontId(fontId);
  return fontSubsets.map((subset) => ({
    key: `${font.id}-${weight}-${subset}`,
    font,
    weight,
    subset,
    path: `${font.packageName}/files/${font.fileStem}-${subset}-${weight}-normal.woff`,
  }));
}
