import { toScreenX, toScreenY, visibleRect, type Camera } from '@shared/editing/camera';
import { gridSteps, gridValues, type GridUnit } from '@shared/editing/grid';
import type { Scene, ViewItem } from '@shared/editing/scene';
import { normaliseRect, projectBox, screenAxis, type Rect2, type ViewDef } from '@shared/editing/views';
import type { OverlayState } from '../overlay';
import { PALETTE } from '../palette';
import { drawCog, screenRect, type Viewport } from './model';

export const RULER_PX = 22;
export const HANDLE_PX = 9;

export type OverlayOptions = {
  cam: Camera;
  vp: Viewport;
  view: ViewDef;
  scene: Scene;
  selectedMembers: readonly ViewItem[];
  selectedModules: readonly ViewItem[];
  /** Members the selected modules bear on, marked so the builder sees what carries them. */
  bearingMembers?: readonly ViewItem[];
  overlay: OverlayState;
  /** Show end handles (one member selected, editable). */
  handles: boolean;
  unit: GridUnit;
  fmt: (mm: number) => string;
  compact: boolean;
};

function tick(ctx: CanvasRenderingContext2D, x: number, y: number, dx: number, dy: number): void {
  ctx.moveTo(x - dx, y - dy);
  ctx.lineTo(x + dx, y + dy);
}

function textBox(ctx: CanvasRenderingContext2D, text: string, x: number, y: number, vertical = false): void {
  ctx.save();
  ctx.translate(x, y);
  if (vertical) ctx.rotate(-Math.PI / 2);
  ctx.font = '600 12px Barlow, sans-serif';
  const w = ctx.measureText(text).width + 8;
  ctx.fillStyle = PALETTE.labelBack;
  ctx.fillRect(-w / 2, -8, w, 16);
  ctx.fillStyle = PALETTE.dimension;
  ctx.textAlign = 'center';
  ctx.textBaseline = 'middle';
  ctx.fillText(text, 0, 0.5);
  ctx.restore();
}

/** A dimension line between two screen points on one line, with extension lines back to `from`, and its text. */
function dimension(ctx: CanvasRenderingContext2D, along: 'h' | 'v', a: number, b: number, at: number, from: number, text: string): void {
  ctx.strokeStyle = PALETTE.dimension;
  ctx.lineWidth = 1;
  ctx.beginPath();
  if (along === 'h') {
    ctx.moveTo(a, from);
    ctx.lineTo(a, at + 4 * Math.sign(at - from));
    ctx.moveTo(b, from);
    ctx.lineTo(b, at + 4 * Math.sign(at - from));
    ctx.moveTo(a, at);
    ctx.lineTo(b, at);
    tick(ctx, a, at, 4, 4);
    tick(ctx, b, at, 4, 4);
  } else {
    ctx.moveTo(from, a);
    ctx.lineTo(at + 4 * Math.sign(at - from), a);
    ctx.moveTo(from, b);
    ctx.lineTo(at + 4 * Math.sign(at - from), b);
    ctx.moveTo(at, a);
    ctx.lineTo(at, b);
    tick(ctx, at, a, 4, 4);
    tick(ctx, at, b, 4, 4);
  }
  ctx.stroke();
  if (Math.abs(b - a) > 24) {
    if (along === 'h') textBox(ctx, text, (a + b) / 2, at);
    else textBox(ctx, text, at, (a + b) / 2, true);
  }
}

function outlineRect(ctx: CanvasRenderingContext2D, cam: Camera, r: Rect2, colour: string, width: number, dash: number[] = []): void {
  const s = screenRect(cam, r);
  ctx.strokeStyle = colour;
  ctx.lineWidth = width;
  ctx.setLineDash(dash);
  ctx.strokeRect(s.x - width / 2, s.y - width / 2, s.w + width, s.h + width);
  ctx.setLineDash([]);
}

export function drawOverlay(ctx: CanvasRenderingContext2D, o: OverlayOptions): void {
  const { cam, overlay } = o;

  // Overall sizes of the frame in this view.
  if (o.scene.bounds && !o.compact) {
    const b = projectBox(o.view, o.scene.bounds);
    const s = screenRect(cam, b);
    dimension(ctx, 'h', s.x, s.x + s.w, s.y + s.h + 30, s.y + s.h + 4, o.fmt(b.x1 - b.x0));
    dimension(ctx, 'v', s.y, s.y + s.h, s.x - 30, s.x - 4, o.fmt(b.y1 - b.y0));
  }

  if (o.scene.cog) {
    const c = o.scene.cog;
    const h = c[o.view.h];
    const v = c[o.view.v];
    drawCog(ctx, toScreenX(cam, h), toScreenY(cam, v), o.compact ? 5 : 8);
  }

  if (overlay.hover && !o.compact) outlineRect(ctx, cam, overlay.hover, PALETTE.selection, 1, [3, 2]);

  for (const item of o.bearingMembers ?? []) {
    ctx.fillStyle = PALETTE.swapTarget;
    const s = screenRect(cam, item);
    ctx.fillRect(s.x, s.y, s.w, s.h);
    outlineRect(ctx, cam, item, PALETTE.snap, 2);
  }
  for (const item of o.selectedModules) {
    ctx.fillStyle = PALETTE.selectionFill;
    const s = screenRect(cam, item);
    ctx.fillRect(s.x, s.y, s.w, s.h);
    outlineRect(ctx, cam, item, PALETTE.selection, 2, [8, 4]);
  }
  for (const item of o.selectedMembers) {
    ctx.fillStyle = PALETTE.selectionFill;
    const s = screenRect(cam, item);
    ctx.fillRect(s.x, s.y, s.w, s.h);
    outlineRect(ctx, cam, item, PALETTE.selection, 2);
  }

  // The selected member's length, beside it.
  if (o.selectedMembers.length === 1 && !o.compact) {
    const item = o.selectedMembers[0];
    const m = o.scene.members[item.index];
    const along = screenAxis(o.view, m.axis);
    const s = screenRect(cam, item);
    if (along === 'h') dimension(ctx, 'h', s.x, s.x + s.w, s.y - 18, s.y - 2, o.fmt(m.cutLength_mm));
    else if (along === 'v') dimension(ctx, 'v', s.y, s.y + s.h, s.x + s.w + 18, s.x + s.w + 2, o.fmt(m.cutLength_mm));
    if (o.handles && along !== null) {
      ctx.fillStyle = PALETTE.handle;
      ctx.strokeStyle = PALETTE.selection;
      ctx.lineWidth = 2;
      const pts = along === 'h' ? [[s.x, s.y + s.h / 2], [s.x + s.w, s.y + s.h / 2]] : [[s.x + s.w / 2, s.y + s.h], [s.x + s.w / 2, s.y]];
      for (const [x, y] of pts) {
        ctx.fillRect(x - HANDLE_PX / 2, y - HANDLE_PX / 2, HANDLE_PX, HANDLE_PX);
        ctx.strokeRect(x - HANDLE_PX / 2, y - HANDLE_PX / 2, HANDLE_PX, HANDLE_PX);
      }
    }
  }

  if (overlay.swapTarget) {
    const s = screenRect(cam, overlay.swapTarget);
    ctx.fillStyle = PALETTE.swapTarget;
    ctx.fillRect(s.x, s.y, s.w, s.h);
    outlineRect(ctx, cam, overlay.swapTarget, PALETTE.snap, 2, [4, 3]);
  }

  if (overlay.ghost.length > 0) {
    ctx.fillStyle = PALETTE.ghost;
    ctx.strokeStyle = PALETTE.selection;
    ctx.lineWidth = 1;
    ctx.beginPath();
    for (const r of overlay.ghost) {
      const s = screenRect(cam, r);
      ctx.rect(s.x, s.y, s.w, s.h);
    }
    ctx.fill();
    ctx.stroke();
  }

  if (overlay.draft) {
    const s = screenRect(cam, overlay.draft);
    ctx.fillStyle = PALETTE.ghost;
    ctx.fillRect(s.x, s.y, s.w, s.h);
    outlineRect(ctx, cam, overlay.draft, PALETTE.selection, 1.5);
    const d = overlay.draft;
    const horizontal = d.x1 - d.x0 >= d.y1 - d.y0;
    if (horizontal) dimension(ctx, 'h', s.x, s.x + s.w, s.y - 18, s.y - 2, o.fmt(d.x1 - d.x0));
    else dimension(ctx, 'v', s.y, s.y + s.h, s.x + s.w + 18, s.x + s.w + 2, o.fmt(d.y1 - d.y0));
  }

  if (overlay.box) {
    const r = normaliseRect(overlay.box.ax, overlay.box.ay, overlay.box.bx, overlay.box.by);
    const s = screenRect(cam, r);
    const touching = overlay.box.bx < overlay.box.ax;
    ctx.fillStyle = 'rgba(62, 106, 134, 0.08)';
    ctx.fillRect(s.x, s.y, s.w, s.h);
    outlineRect(ctx, cam, r, '#3E6A86', 1, touching ? [5, 4] : []);
  }

  for (const cue of overlay.cues) {
    if (cue.target.kind === 'grid') continue;
    ctx.strokeStyle = PALETTE.snap;
    ctx.lineWidth = 1.5;
    ctx.setLineDash([5, 3]);
    ctx.beginPath();
    if (cue.axis === 'h') {
      const x = toScreenX(cam, cue.target.value);
      const lo = Math.min(toScreenY(cam, cue.target.from), toScreenY(cam, cue.v)) - 16;
      const hi = Math.max(toScreenY(cam, cue.target.to), toScreenY(cam, cue.v)) + 16;
      ctx.moveTo(x, lo);
      ctx.lineTo(x, hi);
    } else {
      const y = toScreenY(cam, cue.target.value);
      const lo = Math.min(toScreenX(cam, cue.target.from), toScreenX(cam, cue.h)) - 16;
      const hi = Math.max(toScreenX(cam, cue.target.to), toScreenX(cam, cue.h)) + 16;
      ctx.moveTo(lo, y);
      ctx.lineTo(hi, y);
    }
    ctx.stroke();
    ctx.setLineDash([]);
    const px = toScreenX(cam, cue.h);
    const py = toScreenY(cam, cue.v);
    ctx.fillStyle = PALETTE.snap;
    ctx.beginPath();
    ctx.moveTo(px, py - 6);
    ctx.lineTo(px + 6, py);
    ctx.lineTo(px, py + 6);
    ctx.lineTo(px - 6, py);
    ctx.closePath();
    ctx.fill();
  }

  if (overlay.note && overlay.pointer) {
    const x = toScreenX(cam, overlay.pointer.h) + 14;
    const y = toScreenY(cam, overlay.pointer.v) + 22;
    ctx.font = '600 12px Barlow, sans-serif';
    const w = ctx.measureText(overlay.note).width + 10;
    ctx.fillStyle = PALETTE.snap;
    ctx.fillRect(x, y - 9, w, 18);
    ctx.fillStyle = '#FFFFFF';
    ctx.textAlign = 'left';
    ctx.textBaseline = 'middle';
    ctx.fillText(overlay.note, x + 5, y + 0.5);
  }

  if (!o.compact) drawRulers(ctx, o);
}

/** Rulers along the top and left edges, in the display unit, with the pointer marked on both. */
function drawRulers(ctx: CanvasRenderingContext2D, o: OverlayOptions): void {
  const { cam, vp } = o;
  const r = visibleRect(cam, vp.width, vp.height);
  const { minor, major } = gridSteps(cam.scale, o.unit, 8);
  ctx.fillStyle = PALETTE.ruler;
  ctx.fillRect(0, 0, vp.width, RULER_PX);
  ctx.fillRect(0, 0, RULER_PX, vp.height);
  ctx.strokeStyle = PALETTE.rulerText;
  ctx.lineWidth = 1;
  ctx.beginPath();
  for (const h of gridValues(r.x0, r.x1, minor)) {
    const x = Math.round(toScreenX(cam, h)) + 0.5;
    const big = Math.abs(h / major - Math.round(h / major)) < 1e-6;
    ctx.moveTo(x, RULER_PX);
    ctx.lineTo(x, RULER_PX - (big ? 9 : 4));
  }
  for (const v of gridValues(r.y0, r.y1, minor)) {
    const y = Math.round(toScreenY(cam, v)) + 0.5;
    const big = Math.abs(v / major - Math.round(v / major)) < 1e-6;
    ctx.moveTo(RULER_PX, y);
    ctx.lineTo(RULER_PX - (big ? 9 : 4), y);
  }
  ctx.stroke();
  ctx.fillStyle = PALETTE.rulerText;
  ctx.font = '500 10px Barlow, sans-serif';
  ctx.textBaseline = 'top';
  ctx.textAlign = 'left';
  for (const h of gridValues(r.x0, r.x1, major)) ctx.fillText(o.fmt(h).replace(' mm', ''), toScreenX(cam, h) + 2, 2);
  for (const v of gridValues(r.y0, r.y1, major)) {
    ctx.save();
    ctx.translate(2, toScreenY(cam, v) - 2);
    ctx.rotate(-Math.PI / 2);
    ctx.fillText(o.fmt(v).replace(' mm', ''), 0, 0);
    ctx.restore();
  }
  if (o.overlay.pointer) {
    ctx.fillStyle = PALETTE.selection;
    const x = toScreenX(cam, o.overlay.pointer.h);
    const y = toScreenY(cam, o.overlay.pointer.v);
    ctx.fillRect(x - 0.5, 0, 1.5, RULER_PX);
    ctx.fillRect(0, y - 0.5, RULER_PX, 1.5);
  }
  ctx.fillStyle = PALETTE.ruler;
  ctx.fillRect(0, 0, RULER_PX, RULER_PX);
  ctx.fillStyle = PALETTE.rulerText;
  ctx.font = '700 10px Barlow, sans-serif';
  ctx.textAlign = 'center';
  ctx.textBaseline = 'middle';
  ctx.fillText(o.unit, RULER_PX / 2, RULER_PX / 2);
}
