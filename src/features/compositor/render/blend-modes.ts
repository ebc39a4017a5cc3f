import type { BlendMode } from '@shared/scene';

// The PSD names of W3C Compositing Level 1 separable modes, mapped to the canvas's spelling of the same modes.
const canvasModes: Record<BlendMode, GlobalCompositeOperation> = {
  normal: 'source-over',
  multiply: 'multiply',
  screen: 'screen',
  overlay: 'overlay',
  darken: 'darken',
  lighten: 'lighten',
  'color dodge': 'color-dodge',
  'color burn': 'color-burn',
  'hard light': 'hard-light',
  'soft light': 'soft-light',
  difference: 'difference',
  exclusion: 'exclusion',
};

export const canvasCompositeFor = (mode: BlendMode): GlobalCompositeOperation => canvasModes[mode];

export const blendModeLabels: Record<BlendMode, string> = {
  normal: 'Normal', multiply: 'Multiply', screen: 'Screen', overlay: 'Overlay', darken: 'Darken', lighten: 'Lighten',
  'color dodge': 'Colour dodge', 'color burn': 'Colour burn', 'hard light': 'Hard light', 'soft light': 'Soft light',
  difference: 'Difference', exclusion: 'Exclusion',
};
