import { applyToPoint, compose, type Affine } from '@shared/geometry';
import { placementLocalSize, placementToTemplate, type Layout, type SnapGuide } from '@shared/scene';
import type { TemplateGeometry } from '@shared/templates';
import type { EditorState } from '../editor';
import { HANDLE_SIZE_PX, selectionHandles } from '../tools/handles';
import { viewportMatrix } from '../viewport';
import { rulerTicks, templatePxPerUnit } from './ruler-ticks';
import type { Rect } from '@shared/geometry';

type Ctx2D = CanvasRenderingContext2D;

const SELECTION = '#1f6f8b';
const GUIDE = '#d0388a';
export const RULER_PX = 22;

/** Selection outlines and handles, snap guides, the marquee and the rulers: in screen px, over the scene. */
export function drawEditorChrome(ctx: Ctx2D, state: EditorState, bounds: Rect | null, geometry: TemplateGeometry, dpi: number, screen: { width: number; height: number }, dpr: number): void {
  const vm = viewportMatrix(state.viewport);
  ctx.save();
  ctx.setTransform(dpr, 0, 0, dpr, 0, 0);
  ctx.globalAlpha = 1;
  ctx.globalCompositeOperation = 'source-over';
  drawGuides(ctx, state.guides, vm);
  drawOutlines(ctx, state.scene.layout, state.selection, vm);
  if (bounds) drawHandles(ctx, bounds, state);
  if (state.marquee) {
    const a = applyToPoint(vm, { x: state.marquee.x, y: state.marquee.y });
    const b = applyToPoint(vm, { x: state.marquee.x + state.marquee.width, y: state.marquee.y + state.marquee.height });
    ctx.fillStyle = 'rgba(31, 111, 139, 0.08)';
    ctx.strokeStyle = SELECTION;
    ctx.setLineDash([4, 3]);
    ctx.fillRect(a.x, a.y, b.x - a.x, b.y - a.y);
    ctx.strokeRect(a.x + 0.5, a.y + 0.5, b.x - a.x, b.y - a.y);
    ctx.setLineDash([]);
  }
  if (state.overlays.rulers) drawRulers(ctx, state, geometry, dpi, screen);
  ctx.restore();
}

function drawOutlines(ctx: Ctx2D, layout: Layout, selection: readonly string[], vm: Affine) {
  if (selection.length === 0) return;
  const selected = new Set(selection);
  ctx.lineWidth = 1;
  for (const p of layout.placements) {
    if (!selected.has(p.id)) continue;
    const m = compose(placementToTemplate(p), vm);
    const { width, height } = placementLocalSize(p);
    const corners = [applyToPoint(m, { x: 0, y: 0 }), applyToPoint(m, { x: width, y: 0 }), applyToPoint(m, { x: width, y: height }), applyToPoint(m, { x: 0, y: height })];
    ctx.strokeStyle = p.locked ? '#8a8478' : SELECTION;
    ctx.setLineDash(p.locked ? [3, 3] : []);
    ctx.beginPath();
    corners.forEach((c, i) => (i === 0 ? ctx.moveTo(c.x, c.y) : ctx.lineTo(c.x, c.y)));
    ctx.closePath();
    ctx.stroke();
  }
  ctx.setLineDash([]);
}

function drawHandles(ctx: Ctx2D, bounds: Rect, state: EditorState) {
  const handles = selectionHandles(bounds, state.viewport);
  const [nw, , se] = handles;
  ctx.strokeStyle = SELECTION;
  ctx.lineWidth = 1;
  ctx.setLineDash([2, 3]);
  ctx.strokeRect(nw.screen.x, nw.screen.y, se.screen.x - nw.screen.x, se.screen.y - nw.screen.y);
  ctx.setLineDash([]);
  const rotate = handles[4];
  ctx.beginPath();
  ctx.moveTo(rotate.screen.x, nw.screen.y);
  ctx.lineTo(rotate.screen.x, rotate.screen.y);
  ctx.stroke();
  const half = HANDLE_SIZE_PX / 2;
  for (const h of handles) {
    ctx.fillStyle = '#ffffff';
    ctx.beginPath();
    if (h.kind === 'rotate') ctx.arc(h.screen.x, h.screen.y, half + 1, 0, Math.PI * 2);
    else ctx.rect(h.screen.x - half, h.screen.y - half, HANDLE_SIZE_PX, HANDLE_SIZE_PX);
    ctx.fill();
    ctx.stroke();
  }
}

function drawGuides(ctx: Ctx2D, guides: readonly SnapGuide[], vm: Affine) {
  if (guides.length === 0) return;
  ctx.strokeStyle = GUIDE;
  ctx.lineWidth = 1;
  ctx.beginPath();
  for (const g of guides) {
    const a = applyToPoint(vm, g.axis === 'x' ? { x: g.position, y: g.from } : { x: g.from, y: g.position });
    const b = applyToPoint(vm, g.axis === 'x' ? { x: g.position, y: g.to } : { x: g.to, y: g.position });
    ctx.moveTo(Math.round(a.x) + 0.5, Math.round(a.y) + 0.5);
    ctx.lineTo(Math.round(b.x) + 0.5, Math.round(b.y) + 0.5);
  }
  ctx.stroke();
}

function drawRulers(ctx: Ctx2D, state: EditorState, g: TemplateGeometry, dpi: number, screen: { width: number; height: number }) {
  const v = state.viewport;
  const perUnit = templatePxPerUnit(state.rulerUnit, dpi) * v.zoom;
  ctx.fillStyle = 'rgba(251, 250, 247, 0.95)';
  ctx.fillRect(0, 0, screen.width, RULER_PX);
  ctx.fillRect(0, 0, RULER_PX, screen.height);
  ctx.strokeStyle = '#8a8478';
  ctx.fillStyle = '#4a463f';
  ctx.font = '10px "Source Sans 3", sans-serif';
  ctx.lineWidth = 1;
  ctx.beginPath();
  // 0 sits on the trim's top-left corner: that is where a printer's measurements start.
  for (const t of rulerTicks(g.trim.x * v.zoom + v.panX, perUnit, screen.width, state.rulerUnit)) {
    if (t.at < RULER_PX) continue;
    const x = Math.round(t.at) + 0.5;
    ctx.moveTo(x, RULER_PX);
    ctx.lineTo(x, RULER_PX - (t.major ? 10 : 5));
    if (t.label) ctx.fillText(t.label, x + 2, 10);
  }
  for (const t of rulerTicks(g.trim.y * v.zoom + v.panY, perUnit, screen.height, state.rulerUnit)) {
    if (t.at < RULER_PX) continue;
    const y = Math.round(t.at) + 0.5;
    ctx.moveTo(RULER_PX, y);
    ctx.lineTo(RULER_PX - (t.major ? 10 : 5), y);
    if (t.label) ctx.fillText(t.label, 2, y - 2);
  }
  ctx.stroke();
  ctx.fillStyle = '#4a463f';
  ctx.fillText(state.rulerUnit, 3, 14);
}
