// Zoom steps of the motif preview: fine below 100 %, then whole multiples for looking at pixels.
export const ZOOM_STEPS = [0.05, 0.1, 0.25, 0.5, 0.75, 1, 1.5, 2, 3, 4, 6, 8, 12, 16] as const;
export const ZOOM_MIN = ZOOM_STEPS[0];
export const ZOOM_MAX = ZOOM_STEPS[ZOOM_STEPS.length - 1];

// A small motif is enlarged to fill the box, but not past 4x, where it would only look blurred.
const FIT_MAX = 4;

export function fitZoom(width: number, height: number, boxWidth: number, boxHeight: number): number {
  if (width <= 0 || height <= 0 || boxWidth <= 0 || boxHeight <= 0) return 1;
  return Math.max(ZOOM_MIN, Math.min(boxWidth / width, boxHeight / height, FIT_MAX));
}

export function nextZoom(current: number, direction: 'in' | 'out'): number {
  if (direction === 'in') return ZOOM_STEPS.find((step) => step > current * 1.001) ?? ZOOM_MAX;
  return [...ZOOM_STEPS].reverse().find((step) => step < current * 0.999) ?? ZOOM_MIN;
}
