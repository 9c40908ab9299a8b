import { resolveProfile, type Outline } from '@shared/catalog/profiles';
import { toScreenX, toScreenY, visibleRect, type Camera } from '@shared/editing/camera';
import { gridSteps, gridValues, type GridUnit } from '@shared/editing/grid';
import type { Scene, SceneMember, ViewItem } from '@shared/editing/scene';
import { projectBox, rectsOverlap, screenAxis, type ViewDef } from '@shared/editing/views';
import { MODULE_EDGE, MODULE_FILL, PALETTE, utilisationBand } from '../palette';

export type Viewport = { width: number; height: number };

export function drawGrid(ctx: CanvasRenderingContext2D, cam: Camera, vp: Viewport, unit: GridUnit): void {
  const { minor, major } = gridSteps(cam.scale, unit);
  const r = visibleRect(cam, vp.width, vp.height);
  ctx.lineWidth = 1;
  for (const [step, colour] of [
    [minor, PALETTE.gridMinor],
    [major, PALETTE.gridMajor],
  ] as const) {
    ctx.strokeStyle = colour;
    ctx.beginPath();
    for (const h of gridValues(r.x0, r.x1, step)) {
      const x = Math.round(toScreenX(cam, h)) + 0.5;
      ctx.moveTo(x, 0);
      ctx.lineTo(x, vp.height);
    }
    for (const v of gridValues(r.y0, r.y1, step)) {
      const y = Math.round(toScreenY(cam, v)) + 0.5;
      ctx.moveTo(0, y);
      ctx.lineTo(vp.width, y);
    }
    ctx.stroke();
  }
  // The origin lines: the floor and the frame's datum corner.
  ctx.strokeStyle = PALETTE.axis;
  ctx.setLineDash([6, 4]);
  ctx.beginPath();
  const ox = Math.round(toScreenX(cam, 0)) + 0.5;
  const oy = Math.round(toScreenY(cam, 0)) + 0.5;
  ctx.moveTo(ox, 0);
  ctx.lineTo(ox, vp.height);
  ctx.moveTo(0, oy);
  ctx.lineTo(vp.width, oy);
  ctx.stroke();
  ctx.setLineDash([]);
}

const outlineCache = new Map<string, Outline | null>();
function outlineOf(profileId: string): Outline | null {
  if (!outlineCache.has(profileId)) {
    try {
      outlineCache.set(profileId, resolveProfile(profileId).outline);
    } catch {
      // A document's own profile record: its base outline is not known here; a plain box is drawn.
      outlineCache.set(profileId, null);
    }
  }
  return outlineCache.get(profileId) ?? null;
}

export type ScreenRect = { x: number; y: number; w: number; h: number };

/**
 * Whether something nearer than items[i] covers the point (h, v) (mm). Items are sorted far to near, so only the
 * ones after i can. Used to leave out the labels of things hidden behind others.
 */
function covered(items: readonly ViewItem[], i: number, h: number, v: number): boolean {
  const near = items[i].near;
  for (let j = i + 1; j < items.length; j++) {
    const r = items[j];
    if (r.near > near + 1e-6 && h > r.x0 && h < r.x1 && v > r.y0 && v < r.y1) return true;
  }
  return false;
}

export function screenRect(cam: Camera, r: { x0: number; x1: number; y0: number; y1: number }): ScreenRect {
  const x = toScreenX(cam, r.x0);
  const y = toScreenY(cam, r.y1);
  return { x, y, w: Math.max((r.x1 - r.x0) * cam.scale, 1), h: Math.max((r.y1 - r.y0) * cam.scale, 1) };
}

/** A member seen end-on: its cross-section outline stretched onto its box (a quarter turn shows as a tall box). */
function drawSection(ctx: CanvasRenderingContext2D, s: ScreenRect, outline: Outline): void {
  const xs = outline.outer.map((p) => p.x);
  const ys = outline.outer.map((p) => p.y);
  const w = Math.max(...xs) - Math.min(...xs);
  const h = Math.max(...ys) - Math.min(...ys);
  const turned = (s.w > s.h) !== (w > h) && Math.abs(s.w - s.h) > 1;
  const map = (p: { x: number; y: number }): [number, number] =>
    turned ? [s.x + (p.y / h) * s.w, s.y + s.h - (p.x / w) * s.h] : [s.x + (p.x / w) * s.w, s.y + s.h - (p.y / h) * s.h];
  ctx.beginPath();
  for (const ring of [outline.outer, ...outline.holes]) {
    ring.forEach((p, i) => {
      const [x, y] = map(p);
      if (i === 0) ctx.moveTo(x, y);
      else ctx.lineTo(x, y);
    });
    ctx.closePath();
  }
  ctx.fill('evenodd');
  ctx.stroke();
}

function memberFill(m: SceneMember, colourByLoad: boolean): string {
  if (colourByLoad && m.utilisation !== null) return utilisationBand(m.utilisation).fill;
  return PALETTE.member;
}

export type ModelOptions = {
  cam: Camera;
  vp: Viewport;
  view: ViewDef;
  scene: Scene;
  items: { members: ViewItem[]; modules: ViewItem[] };
  compact: boolean;
  colourByLoad: boolean;
  /** Members and modules being dragged: drawn faint where they were. */
  faded: ReadonlySet<string>;
  /** A mass as the frame reads it ("12.4 kg", "27.3 lb"). */
  massText: (kg: number) => string;
};

function label(ctx: CanvasRenderingContext2D, text: string, cx: number, cy: number, size: number): void {
  ctx.font = `600 ${size}px Barlow, sans-serif`;
  const w = ctx.measureText(text).width + 6;
  const h = size + 4;
  ctx.fillStyle = PALETTE.labelBack;
  ctx.fillRect(cx - w / 2, cy - h / 2, w, h);
  ctx.strokeStyle = PALETTE.memberEdge;
  ctx.lineWidth = 1;
  ctx.strokeRect(Math.round(cx - w / 2) + 0.5, Math.round(cy - h / 2) + 0.5, Math.round(w), Math.round(h));
  ctx.fillStyle = PALETTE.label;
  ctx.textAlign = 'center';
  ctx.textBaseline = 'middle';
  ctx.fillText(text, cx, cy + 0.5);
}

export function drawModules(ctx: CanvasRenderingContext2D, o: ModelOptions): void {
  const visible = visibleRect(o.cam, o.vp.width, o.vp.height);
  o.items.modules.forEach((item, order) => {
    if (!rectsOverlap(item, visible)) return;
    const m = o.scene.modules[item.index];
    const s = screenRect(o.cam, item);
    ctx.globalAlpha = o.faded.has(m.id) ? 0.35 : 1;
    ctx.fillStyle = MODULE_FILL[m.kind];
    ctx.fillRect(s.x, s.y, s.w, s.h);
    ctx.strokeStyle = MODULE_EDGE[m.kind];
    ctx.lineWidth = 1.5;
    ctx.setLineDash([7, 4]);
    ctx.strokeRect(s.x, s.y, s.w, s.h);
    ctx.setLineDash([]);
    // A module behind another shows its outline only: two names on top of each other read as neither.
    const hidden = covered(o.items.modules, order, item.x0 + 2, item.y1 - 2);
    if (hidden) {
      // nothing more to draw
    } else if (!o.compact && s.w > 60 && s.h > 34) {
      ctx.save();
      ctx.beginPath();
      ctx.rect(s.x, s.y, s.w, s.h);
      ctx.clip();
      ctx.fillStyle = MODULE_EDGE[m.kind];
      ctx.textAlign = 'left';
      ctx.textBaseline = 'top';
      ctx.font = '600 13px Barlow, sans-serif';
      ctx.fillText(m.name, s.x + 8, s.y + 8);
      ctx.font = '500 12px Barlow, sans-serif';
      ctx.fillText(o.massText(m.mass_kg), s.x + 8, s.y + 24);
      ctx.restore();
    } else if (o.compact && s.w > 24 && s.h > 14) {
      ctx.fillStyle = MODULE_EDGE[m.kind];
      ctx.font = '600 10px Barlow, sans-serif';
      ctx.textAlign = 'left';
      ctx.textBaseline = 'top';
      ctx.fillText(m.name.slice(0, Math.max(1, Math.floor(s.w / 6))), s.x + 3, s.y + 3);
    }
  });
  ctx.globalAlpha = 1;
}

/** Drawer boxes, panels and the countertop: thin, translucent outlines over the modules, so the frame reads through. */
export function drawSheetGoods(ctx: CanvasRenderingContext2D, o: ModelOptions): void {
  const goods = o.scene.goods;
  if (!goods?.length) return;
  const visible = visibleRect(o.cam, o.vp.width, o.vp.height);
  ctx.save();
  ctx.lineWidth = 1;
  for (const g of goods) {
    const r = projectBox(o.view, g.box);
    if (!rectsOverlap(r, visible)) continue;
    const sc = screenRect(o.cam, r);
    ctx.fillStyle = g.kind === 'drawer' ? PALETTE.goodsDrawer : PALETTE.goodsPanel;
    ctx.fillRect(sc.x, sc.y, sc.w, sc.h);
    ctx.strokeStyle = PALETTE.goodsEdge;
    ctx.strokeRect(Math.round(sc.x) + 0.5, Math.round(sc.y) + 0.5, Math.round(sc.w), Math.round(sc.h));
  }
  ctx.restore();
}

export function drawMembers(ctx: CanvasRenderingContext2D, o: ModelOptions): void {
  const visible = visibleRect(o.cam, o.vp.width, o.vp.height);
  const scale = o.cam.scale;
  const labels: [string, number, number, number][] = [];
  ctx.lineWidth = 1;
  ctx.strokeStyle = PALETTE.memberEdge;
  o.items.members.forEach((item, order) => {
    if (!rectsOverlap(item, visible)) return;
    const m = o.scene.members[item.index];
    const s = screenRect(o.cam, item);
    ctx.globalAlpha = o.faded.has(m.id) ? 0.3 : 1;
    ctx.fillStyle = memberFill(m, o.colourByLoad);
    const along = screenAxis(o.view, m.axis);
    const outline = along === null && s.w >= 18 && s.h >= 18 ? outlineOf(m.profileId) : null;
    if (outline) {
      drawSection(ctx, s, outline);
    } else {
      ctx.fillRect(s.x, s.y, s.w, s.h);
      if (s.w > 3 && s.h > 3) ctx.strokeRect(s.x + 0.5, s.y + 0.5, s.w - 1, s.h - 1);
    }
    // The slot along a member's face, once it is wide enough on screen to read as a slot.
    if (along !== null && m.slot_mm !== null && m.slot_mm * scale >= 2.5) {
      const across = along === 'h' ? s.h : s.w;
      const acrossMm = along === 'h' ? item.y1 - item.y0 : item.x1 - item.x0;
      const own = 'xyz'.indexOf(m.axis);
      const crossDims = [0, 1, 2].filter((i) => i !== own).map((i) => m.box.max[i] - m.box.min[i]);
      // One slot per module of the section (a 40×80 seen on its wide face shows two).
      const slots = Math.max(1, Math.round(acrossMm / Math.min(...crossDims)));
      const slotPx = m.slot_mm * scale;
      ctx.strokeStyle = PALETTE.slot;
      ctx.beginPath();
      for (let k = 0; k < slots; k++) {
        const c = (across * (k + 0.5)) / slots;
        for (const side of [-1, 1]) {
          const off = c + (side * slotPx) / 2;
          if (along === 'h') {
            const y = Math.round(s.y + off) + 0.5;
            ctx.moveTo(s.x + 1, y);
            ctx.lineTo(s.x + s.w - 1, y);
          } else {
            const x = Math.round(s.x + off) + 0.5;
            ctx.moveTo(x, s.y + 1);
            ctx.lineTo(x, s.y + s.h - 1);
          }
        }
      }
      ctx.stroke();
      ctx.strokeStyle = PALETTE.memberEdge;
    }
    if (!o.compact && m.mark && Math.max(s.w, s.h) >= 30) labels.push([m.mark, s.x + s.w / 2, s.y + s.h / 2, order]);
  });
  ctx.globalAlpha = 1;
  // Part marks last, so no member covers another's mark; a member hidden behind a nearer one keeps its mark to itself.
  for (const [text, x, y, order] of labels) {
    const item = o.items.members[order];
    if (!covered(o.items.members, order, (item.x0 + item.x1) / 2, (item.y0 + item.y1) / 2)) label(ctx, text, x, y, 11);
  }
}

/** The centre of gravity: a circle in quarters, the usual drawing symbol. */
export function drawCog(ctx: CanvasRenderingContext2D, x: number, y: number, r = 8): void {
  ctx.fillStyle = '#FFFFFF';
  ctx.strokeStyle = PALETTE.cog;
  ctx.lineWidth = 1.5;
  ctx.beginPath();
  ctx.arc(x, y, r, 0, Math.PI * 2);
  ctx.fill();
  ctx.stroke();
  ctx.fillStyle = PALETTE.cog;
  for (const start of [0, Math.PI]) {
    ctx.beginPath();
    ctx.moveTo(x, y);
    ctx.arc(x, y, r, start - Math.PI / 2, start);
    ctx.closePath();
    ctx.fill();
  }
}
