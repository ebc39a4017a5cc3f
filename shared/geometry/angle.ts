// Branded so that passing degrees where radians are expected is a type error.
export type Radians = number & { readonly __unit: 'rad' };
export type Degrees = number & { readonly __unit: 'deg' };

export const degrees = (n: number): Degrees => n as Degrees;
export const radians = (n: number): Radians => n as Radians;

export const toRadians = (d: Degrees): Radians => radians((d * Math.PI) / 180);
export const toDegrees = (r: Radians): Degrees => degrees((r * 180) / Math.PI);

/** Into [0, 360); -0 becomes 0. */
export function normaliseDegrees(d: number): Degrees {
  const n = d % 360;
  return degrees(n < 0 ? n + 360 : n === 0 ? 0 : n);
}
