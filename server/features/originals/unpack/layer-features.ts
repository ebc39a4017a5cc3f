import type { Layer } from 'ag-psd';
import { isRenderableBlendMode } from '../../../lib/image/blend-modes';

// What the original does that our cut cannot reproduce, in words for the import report.
const EFFECT_NAMES: [keyof NonNullable<Layer['effects']>, string][] = [
  ['dropShadow', 'drop shadow'], ['innerShadow', 'inner shadow'], ['outerGlow', 'outer glow'],
  ['innerGlow', 'inner glow'], ['bevel', 'bevel'], ['solidFill', 'colour overlay'], ['satin', 'satin'],
  ['stroke', 'stroke'], ['gradientOverlay', 'gradient overlay'], ['patternOverlay', 'pattern overlay'],
];

export function unsupportedFeatures(layer: Layer): string[] {
  const features: string[] = [];
  const effects = enabledEffects(layer);
  if (effects.length > 0) features.push(`layer effects not rendered (${effects.join(', ')})`);
  const mode = layer.blendMode ?? 'normal';
  if (!isRenderableBlendMode(mode)) features.push(`blend mode "${mode}" drawn as normal`);
  if (layer.vectorMask && !layer.mask) features.push('vector mask not applied');
  if (layer.realMask) features.push('combined vector and pixel mask: only the pixel mask is applied');
  if (layer.placedLayer) features.push('smart object: its stored pixels are used; the embedded source and its transform are not imported');
  if (hasBlendIf(layer)) features.push('blend-if ranges not applied');
  if (layer.filterMask) features.push('filter mask not applied');
  return features;
}

export function isAdjustmentLayer(layer: Layer): boolean {
  return layer.adjustment !== undefined;
}

export function isTextLayer(layer: Layer): boolean {
  return layer.text !== undefined;
}

export function layerOpacity(layer: Layer): number {
  return clamp01((layer.opacity ?? 1));
}

// fill opacity scales the layer's pixels but not its effects; without effects it acts like opacity
export function layerDrawOpacity(layer: Layer): number {
  return clamp01((layer.opacity ?? 1) * (layer.fillOpacity ?? 1));
}

export function textOf(layer: Layer): { content: string; fontName?: string; sizePt?: number } | undefined {
  const text = layer.text;
  if (!text) return undefined;
  const style = text.style ?? text.styleRuns?.[0]?.style;
  const fontName = style?.font?.name;
  let sizePt: number | undefined;
  if (typeof style?.fontSize === 'number' && Number.isFinite(style.fontSize)) {
    // the stored size is scaled by the text's transform (xx, xy, yx, yy, tx, ty)
    const [xx = 1, xy = 0, yx = 0, yy = 1] = text.transform ?? [];
    const scale = Math.sqrt(Math.abs(xx * yy - xy * yx)) || 1;
    sizePt = Math.round(style.fontSize * scale * 100) / 100;
  }
  return {
    content: (text.text ?? '').replace(/\r\n?/g, '\n'),
    ...(fontName ? { fontName } : {}),
    ...(sizePt !== undefined ? { sizePt } : {}),
  };
}

function enabledEffects(layer: Layer): string[] {
  const effects = layer.effects;
  if (!effects || effects.disabled) return [];
  const names: string[] = [];
  for (const [key, label] of EFFECT_NAMES) {
    const value = effects[key];
    const list = (Array.isArray(value) ? value : value ? [value] : []) as { enabled?: boolean }[];
    if (list.some((effect) => effect.enabled !== false)) names.push(label);
  }
  return names;
}

function hasBlendIf(layer: Layer): boolean {
  const ranges = layer.blendingRanges;
  if (!ranges) return false;
  const isDefault = (range: number[]) => range[0] === 0 && range[1] === 0 && range[2] === 255 && range[3] === 255;
  return !isDefault(ranges.compositeGrayBlendSource) || !isDefault(ranges.compositeGraphBlendDestinationRange)
    || ranges.ranges.some((r) => !isDefault(r.sourceRange) || !isDefault(r.destRange));
}

function clamp01(value: number): number {
  return Number.isFinite(value) ? Math.min(1, Math.max(0, value)) : 1;
}
