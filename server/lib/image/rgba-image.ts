// Straight (not premultiplied) 8-bit RGBA pixels placed at left/top in a document's pixel grid.
export type RgbaImage = { data: Uint8Array; width: number; height: number; left: number; top: number };

export type GrayImage = { data: Uint8Array; width: number; height: number; left: number; top: number };

export type PixelBox = { left: number; top: number; right: number; bottom: number };

export function boxOf(image: { left: number; top: number; width: number; height: number }): PixelBox {
  return { left: image.left, top: image.top, right: image.left + image.width, bottom: image.top + image.height };
}

export function unionBox(a: PixelBox | null, b: PixelBox): PixelBox {
  if (!a) return b;
  return {
    left: Math.min(a.left, b.left),
    top: Math.min(a.top, b.top),
    right: Math.max(a.right, b.right),
    bottom: Math.max(a.bottom, b.bottom),
  };
}

export function createRgbaImage(box: PixelBox): RgbaImage {
  const width = Math.max(0, box.right - box.left);
  const height = Math.max(0, box.bottom - box.top);
  return { data: new Uint8Array(width * height * 4), width, height, left: box.left, top: box.top };
}
