import type { Recolour } from '../colour';
import { compose, translate, type Affine, type Rect } from '../geometry';
import { pointsToPixels, templateGeometry, type PixelSize, type Template, type TemplateGeometry } from '../templates';
import type { Scene } from './layout';
import type { BlendMode } from './placement-base';
import { placementToTemplate, type Placement } from './placement';
import { MAX_REPEAT_TILES, repeatTiles } from './repeat-tiles';
import type { TextPlacement } from './text-placement';

export type DrawRole = 'placement' | 'mirror' | 'tile';

type DrawOpBase = {
  placementId: string;
  /** mirror: the copy on the mug's other side; tile: one tile of a repeat. */
  role: DrawRole;
  /** From the source's own pixels (motif) or the text box to template pixels. */
  matrix: Affine;
  /** Size of the source box the matrix starts from. */
  width: number;
  height: number;
  opacity: number;
  blendMode: BlendMode;
  /** Draw only inside this rect (template pixels); null for no clip. */
  clip: Rect | null;
};

/** The matrix starts from full-resolution motif pixels; a bitmap downscaled k times is drawn with compose(scale(k), matrix). */
export type MotifDrawOp = DrawOpBase & { kind: 'motif'; motifId: string; version: number; recolour: Recolour };

export type TextDrawOp = DrawOpBase & {
  kind: 'text';
  content: string;
  fontId: string;
  /** The font size in template pixels at the template's DPI. */
  sizePx: number;
  colour: string;
  align: TextPlacement['align'];
  letterSpacing: number;
  arcDeg: number;
};

export type DrawOp = MotifDrawOp | TextDrawOp;

export type PlanNote = { placementId: string; code: 'scene.repeat_too_dense'; message: string };

export type RenderPlan = { size: PixelSize; ops: DrawOp[]; notes: PlanNote[] };

export type RenderPlanOptions = {
  /** 'print-area' (default) clips every op as the printer would; the editor may draw outside. */
  clip?: 'print-area' | 'none';
  includeHidden?: boolean;
  /** Overrides the layout's own mirror setting (e.g. a preview without it). */
  mirror?: boolean;
};

/** The vertical line a layout is mirrored about: a wrap's front centre, else the trim's centre. */
export function mirrorAxisX(geometry: TemplateGeometry): number {
  return geometry.frontCentreX ?? geometry.trim.x + geometry.trim.width / 2;
}

/**
 * Mirrored copies keep the artwork unflipped (text stays readable), with the position reflected
 * and the turn reversed, so the two sides look symmetric about the axis.
 */
export function mirroredPlacement(p: Placement, axisX: number): Placement {
  return { ...p, x: 2 * axisX - p.x, rotationDeg: -p.rotationDeg };
}

/** Ordered draw operations (bottom first) that the editor's canvas and the server's renderer both execute. */
export function renderPlan(scene: Scene, template: Template, options: RenderPlanOptions = {}): RenderPlan {
  const geometry = templateGeometry(template);
  const clip = options.clip === 'none' ? null : geometry.printArea;
  const mirror = options.mirror ?? scene.layout.mirror;
  const axis = mirrorAxisX(geometry);
  const ops: DrawOp[] = [];
  const notes: PlanNote[] = [];

  for (const p of scene.layout.placements) {
    if (p.hidden && !options.includeHidden) continue;
    if (p.type === 'repeat') {
      const tiles = repeatTiles(p, clip ?? geometry.bleedRect);
      if (tiles.offsets.length === 0 && tiles.needed > MAX_REPEAT_TILES) {
        notes.push({ placementId: p.id, code: 'scene.repeat_too_dense', message: `This repeat would need more than ${MAX_REPEAT_TILES} tiles; make the tiles larger or the spacing wider` });
      }
      const anchor = placementToTemplate(p);
      for (const o of tiles.offsets) ops.push(opFor(p, compose(anchor, translate(o.x, o.y)), 'tile', clip, template.dpi));
      continue; // a pattern already covers both sides of the mug, so it is never mirrored
    }
    ops.push(opFor(p, placementToTemplate(p), 'placement', clip, template.dpi));
    // a placement sitting on the axis would be drawn twice over itself
    if (mirror && Math.abs(p.x - axis) >= 0.5) ops.push(opFor(p, placementToTemplate(mirroredPlacement(p, axis)), 'mirror', clip, template.dpi));
  }
  return { size: geometry.size, ops, notes };
}

function opFor(p: Placement, matrix: Affine, role: DrawRole, clip: Rect | null, dpi: number): DrawOp {
  // Literal objects, not spreads: plans are rebuilt on every frame of a drag.
  if (p.type === 'text') {
    return {
      kind: 'text', placementId: p.id, role, matrix, width: p.boxWidth, height: p.boxHeight, opacity: p.opacity, blendMode: p.blendMode, clip,
      content: p.content, fontId: p.fontId, sizePx: pointsToPixels(p.sizePt, dpi), colour: p.colour, align: p.align, letterSpacing: p.letterSpacing, arcDeg: p.arcDeg,
    };
  }
  return {
    kind: 'motif', placementId: p.id, role, matrix, width: p.naturalWidth, height: p.naturalHeight, opacity: p.opacity, blendMode: p.blendMode, clip,
    motifId: p.motifId, version: p.version, recolour: p.recolour,
  };
}
