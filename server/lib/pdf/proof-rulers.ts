import { rgb, type PDFFont, type PDFPage } from 'pdf-lib';

// 1 pt = 1/72 in (ISO 32000-1, default user space unit); 1 in = 25.4 mm exactly.
export const CM_PT = 72 / 2.54;
export const INCH_PT = 72;
/** The two rulers' lengths in pt: 10 cm = 283.4646 pt, 4 in = 288 pt. */
export const RULER_LENGTHS_PT = { metric: 10 * CM_PT, imperial: 4 * INCH_PT } as const;
export const RULER_BAND_PT = 62;
export const RULER_THICKNESS_PT = 0.75;

/**
 * A 10 cm ruler (mm ticks) and a 4 in ruler (1/8 in ticks), each drawn as one baseline of its exact
 * length, so a measured sheet shows whether the printer scaled it.
 */
export function drawRulers(page: PDFPage, font: PDFFont, x: number, y: number): void {
  const black = rgb(0, 0, 0);
  const metricY = y + 40;
  const inchY = y + 8;
  ruler(page, font, x, metricY, RULER_LENGTHS_PT.metric, 100, (i) => (i % 10 === 0 ? 8 : i % 5 === 0 ? 5 : 3), (i) => (i % 10 === 0 ? String(i / 10) : null), 'cm');
  ruler(page, font, x, inchY, RULER_LENGTHS_PT.imperial, 32, (i) => (i % 8 === 0 ? 8 : i % 4 === 0 ? 6 : i % 2 === 0 ? 4 : 2.5), (i) => (i % 8 === 0 ? String(i / 8) : null), 'in');
  page.drawText('Check with a ruler: 10 cm and 4 in from end to end.', { x: x + RULER_LENGTHS_PT.imperial + 30, y: inchY + 2, size: 7, font, color: black });
}

function ruler(page: PDFPage, font: PDFFont, x: number, y: number, length: number, divisions: number, tick: (i: number) => number, label: (i: number) => string | null, unit: string): void {
  const black = rgb(0, 0, 0);
  page.drawLine({ start: { x, y }, end: { x: x + length, y }, thickness: RULER_THICKNESS_PT, color: black });
  for (let i = 0; i <= divisions; i++) {
    const tx = x + (length * i) / divisions;
    page.drawLine({ start: { x: tx, y }, end: { x: tx, y: y + tick(i) }, thickness: 0.3, color: black });
    const text = label(i);
    if (text) page.drawText(text, { x: tx - 1.5, y: y + 10, size: 6, font, color: black });
  }
  page.drawText(unit, { x: x + length + 4, y: y - 2, size: 7, font, color: black });
}
