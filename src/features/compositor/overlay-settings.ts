/** Which non-printing guides the canvas draws; each is a toggle in the toolbar. */
export type OverlaySettings = {
  readonly bleed: boolean;
  readonly trim: boolean;
  readonly safeArea: boolean;
  readonly printArea: boolean;
  readonly keepOuts: boolean;
  readonly seam: boolean;
  readonly frontCentre: boolean;
  readonly rulers: boolean;
  /** The template's printer's guide image, laid over the design (shown only when the template has one). */
  readonly guideImage: boolean;
};

export type OverlayName = keyof OverlaySettings;

export const defaultOverlays: OverlaySettings = {
  bleed: true, trim: true, safeArea: true, printArea: true, keepOuts: true, seam: true, frontCentre: true, rulers: true, guideImage: true,
};

export const overlayLabels: Record<OverlayName, string> = {
  bleed: 'Bleed',
  trim: 'Trim line',
  safeArea: 'Safe area',
  printArea: 'Print area',
  keepOuts: 'Keep-out zones',
  seam: 'Wrap seam',
  frontCentre: 'Front centre',
  rulers: 'Rulers',
  guideImage: 'Printer’s guide image',
};

// Half see-through: the design stays readable under the printer's marks.
export const GUIDE_IMAGE_OPACITY = 0.5;

export type RulerUnit = 'in' | 'mm';
