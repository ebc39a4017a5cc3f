// Test-only builders of the Saltmarsh Studio demo placements.
import type { Template } from '../../templates';
import { createScene, emptyLayout, type Layout, type Scene } from '../layout';
import { createMotifPlacement, type MotifPlacementInit } from '../motif-placement';
import type { Placement } from '../placement';
import { createRepeatPlacement, type RepeatPlacementInit } from '../repeat-placement';
import { createTextPlacement, type TextPlacementInit } from '../text-placement';

export const motif = (init: Partial<Omit<MotifPlacementInit, 'type'>> = {}) =>
  createMotifPlacement({ id: 'puffin', motifId: 'm-puffin', version: 1, naturalWidth: 100, naturalHeight: 50, x: 500, y: 300, ...init });

export const text = (init: Partial<Omit<TextPlacementInit, 'type'>> = {}) =>
  createTextPlacement({ id: 'title', content: 'Puffin Picnic', fontId: 'source-sans-3', sizePt: 24, boxWidth: 400, boxHeight: 100, x: 1000, y: 500, ...init });

export const repeat = (init: Partial<Omit<RepeatPlacementInit, 'type'>> = {}) =>
  createRepeatPlacement({ id: 'waves', motifId: 'm-wave', version: 2, naturalWidth: 100, naturalHeight: 100, x: 50, y: 50, ...init });

export const layoutOf = (...placements: Placement[]): Layout => ({ ...emptyLayout, placements });
export const sceneOf = (...placements: Placement[]): Scene => createScene(layoutOf(...placements));

/** 300 x 200 px at 300 dpi, no bleed: small numbers for hand-worked plans. */
export const smallCard: Template = {
  id: 'test-small',
  name: 'Small test card',
  kind: 'custom',
  unit: 'in',
  size: { width: 1, height: 2 / 3 },
  dpi: 300,
  bleed: 0,
  safeMargin: 0.1,
  printArea: null,
  keepOuts: [],
  wrap: null,
  output: { format: 'png', colour: 'rgb', transparency: 'keep', dpi: 300, maxFileSizeMb: 10 },
  blank: { body: '#ffffff' },
  variants: [],
};
