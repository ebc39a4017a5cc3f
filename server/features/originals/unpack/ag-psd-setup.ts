import { initializeCanvas } from 'ag-psd';

let ready = false;

// ag-psd decodes into ImageData only after a canvas factory is registered; the server has no
// canvas, so plain pixel buffers stand in and any real canvas use fails loudly.
export function ensureAgPsdImageData(): void {
  if (ready) return;
  initializeCanvas(
    () => {
      throw new Error('no canvas in the server');
    },
    (width, height) => ({ width, height, data: new Uint8ClampedArray(width * height * 4), colorSpace: 'srgb' }) as ImageData,
  );
  ready = true;
}
