// Blend functions B(Cb, Cs) on colour components in 0..1 (Cb backdrop, Cs source), keyed by the
// PSD blend-mode names ag-psd uses. normal ... exclusion and the four non-separable modes are
// from W3C "Compositing and Blending Level 1" (2015), sections 10.1 and 10.2. Note that its soft
// light is the W3C formula, which differs slightly from some editors' own. linear burn, linear
// dodge, subtract, divide, vivid/linear/pin light, hard mix, darker and lighter color are their
// common definitions (from memory).
export type SeparableBlend = (cb: number, cs: number) => number;
export type Rgb = [number, number, number];
export type NonSeparableBlend = (cb: Rgb, cs: Rgb, out: Rgb) => void;

const multiply: SeparableBlend = (cb, cs) => cb * cs;
const screen: SeparableBlend = (cb, cs) => cb + cs - cb * cs;
const hardLight: SeparableBlend = (cb, cs) => (cs <= 0.5 ? multiply(cb, 2 * cs) : screen(cb, 2 * cs - 1));
const colorDodge: SeparableBlend = (cb, cs) => (cb === 0 ? 0 : cs >= 1 ? 1 : Math.min(1, cb / (1 - cs)));
const colorBurn: SeparableBlend = (cb, cs) => (cb >= 1 ? 1 : cs <= 0 ? 0 : 1 - Math.min(1, (1 - cb) / cs));
const softLight: SeparableBlend = (cb, cs) => {
  if (cs <= 0.5) return cb - (1 - 2 * cs) * cb * (1 - cb);
  const d = cb <= 0.25 ? ((16 * cb - 12) * cb + 4) * cb : Math.sqrt(cb);
  return cb + (2 * cs - 1) * (d - cb);
};
const vividLight: SeparableBlend = (cb, cs) => (cs <= 0.5 ? colorBurn(cb, 2 * cs) : colorDodge(cb, 2 * (cs - 0.5)));
const clamp01 = (v: number) => (v < 0 ? 0 : v > 1 ? 1 : v);

export const separableBlends: Record<string, SeparableBlend> = {
  normal: (_cb, cs) => cs,
  multiply,
  screen,
  overlay: (cb, cs) => hardLight(cs, cb),
  darken: (cb, cs) => Math.min(cb, cs),
  lighten: (cb, cs) => Math.max(cb, cs),
  'color dodge': colorDodge,
  'color burn': colorBurn,
  'hard light': hardLight,
  'soft light': softLight,
  difference: (cb, cs) => Math.abs(cb - cs),
  exclusion: (cb, cs) => cb + cs - 2 * cb * cs,
  'linear burn': (cb, cs) => clamp01(cb + cs - 1),
  'linear dodge': (cb, cs) => clamp01(cb + cs),
  subtract: (cb, cs) => clamp01(cb - cs),
  divide: (cb, cs) => (cs <= 0 ? (cb > 0 ? 1 : 0) : clamp01(cb / cs)),
  'vivid light': vividLight,
  'linear light': (cb, cs) => clamp01(cb + 2 * cs - 1),
  'pin light': (cb, cs) => (cs <= 0.5 ? Math.min(cb, 2 * cs) : Math.max(cb, 2 * cs - 1)),
  'hard mix': (cb, cs) => (vividLight(cb, cs) < 0.5 ? 0 : 1),
};

// W3C section 10.2: Lum, ClipColor, SetLum, Sat, SetSat.
const lum = (c: Rgb) => 0.3 * c[0] + 0.59 * c[1] + 0.11 * c[2];

function clipColor(c: Rgb): void {
  const l = lum(c);
  const n = Math.min(c[0], c[1], c[2]);
  const x = Math.max(c[0], c[1], c[2]);
  for (let i = 0; i < 3; i++) {
    if (n < 0) c[i] = l + ((c[i] - l) * l) / (l - n);
    if (x > 1) c[i] = l + ((c[i] - l) * (1 - l)) / (x - l);
  }
}

function setLum(c: Rgb, l: number, out: Rgb): void {
  const d = l - lum(c);
  out[0] = c[0] + d;
  out[1] = c[1] + d;
  out[2] = c[2] + d;
  clipColor(out);
}

const sat = (c: Rgb) => Math.max(c[0], c[1], c[2]) - Math.min(c[0], c[1], c[2]);

function setSat(c: Rgb, s: number, out: Rgb): void {
  const order = [0, 1, 2].sort((a, b) => c[a] - c[b]);
  const [min, mid, max] = order;
  const range = c[max] - c[min];
  const result: Rgb = [0, 0, 0];
  if (range > 0) {
    result[mid] = ((c[mid] - c[min]) * s) / range;
    result[max] = s;
  }
  out[0] = result[0];
  out[1] = result[1];
  out[2] = result[2];
}

const scratch: Rgb = [0, 0, 0];

export const nonSeparableBlends: Record<string, NonSeparableBlend> = {
  hue: (cb, cs, out) => {
    setSat(cs, sat(cb), scratch);
    setLum(scratch, lum(cb), out);
  },
  saturation: (cb, cs, out) => {
    setSat(cb, sat(cs), scratch);
    setLum(scratch, lum(cb), out);
  },
  color: (cb, cs, out) => setLum(cs, lum(cb), out),
  luminosity: (cb, cs, out) => setLum(cb, lum(cs), out),
  'darker color': (cb, cs, out) => copy(lum(cs) < lum(cb) ? cs : cb, out),
  'lighter color': (cb, cs, out) => copy(lum(cs) > lum(cb) ? cs : cb, out),
};

function copy(from: Rgb, out: Rgb): void {
  out[0] = from[0];
  out[1] = from[1];
  out[2] = from[2];
}

export function isRenderableBlendMode(mode: string): boolean {
  return mode in separableBlends || mode in nonSeparableBlends || mode === 'pass through';
}
