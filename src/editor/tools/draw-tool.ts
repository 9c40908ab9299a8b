import { addMember } from '@shared/editing/edits';
import { snapValue, type SnapRef, type SnapTarget } from '@shared/editing/snap';
import type { Axis } from '@shared/model/axis';
import { roleOf } from '@shared/model/member';
import { resolveProfile } from '@shared/catalog/profiles';
import type { SnapCue } from '../overlay';
import { clearOverlay, dragged, type Phase, type PointerInput, type Tool, type ToolContext } from './tool';

/** Shortest member worth drawing (mm); anything shorter is taken as a slip of the hand. */
const MIN_LENGTH_MM = 10;

type Snapped = { value: number; ref: SnapRef | null; target: SnapTarget | null };

function profileSize(id: string): number {
  try {
    const p = resolveProfile(id);
    return Math.min(p.width_mm, p.height_mm);
  } catch {
    return 40;
  }
}

/**
 * Draw a member by dragging along one of the view's axes: the larger movement decides which. Both ends snap (to
 * member ends and faces, bay and module edges, the grid); an end that snaps to a face attaches to it, so a rail
 * drawn between two uprights follows them when the frame re-lays. The depth comes from the selection or the front
 * of the frame.
 */
export function createDrawTool(): Tool {
  let phase: Phase = 'idle';
  let start: PointerInput | null = null;
  let from: { h: Snapped; v: Snapped } | null = null;
  let draft: { along: 'h' | 'v'; a: Snapped; b: Snapped; across: number } | null = null;

  /** Snap a point; `across` pins the other coordinate a target must reach (the line being drawn along). */
  const snapPoint = (p: PointerInput, ctx: ToolContext, across?: { h?: number; v?: number }) => {
    const t = ctx.targets(new Set());
    const tol = p.alt ? 0 : ctx.snapTolMm;
    const grid = p.alt ? null : ctx.gridStep;
    const h = snapValue(t.h, p.h, tol, grid, across?.v ?? p.v);
    const v = snapValue(t.v, p.v, tol, grid, across?.h ?? p.h);
    return { h: { value: h.value, ref: h.target?.ref ?? null, target: h.target }, v: { value: v.value, ref: v.target?.ref ?? null, target: v.target } };
  };

  return {
    id: 'draw',
    get phase() {
      return phase;
    },
    down(p, ctx) {
      if (ctx.readOnly) return;
      phase = 'pointing';
      start = p;
      from = snapPoint(p, ctx);
      draft = null;
    },
    move(p, ctx) {
      const o = ctx.overlay;
      o.pointer = { h: p.h, v: p.v };
      if (phase === 'idle' || !start || !from) {
        // Show where a press would start.
        if (!ctx.readOnly) {
          const s = snapPoint(p, ctx);
          const cues: SnapCue[] = [];
          if (s.h.target && s.h.target.kind !== 'grid') cues.push({ axis: 'h', target: s.h.target, h: s.h.value, v: s.v.value });
          if (s.v.target && s.v.target.kind !== 'grid') cues.push({ axis: 'v', target: s.v.target, h: s.h.value, v: s.v.value });
          o.cues = cues;
          o.note = cues[0]?.target.label ?? null;
        }
        return;
      }
      if (phase === 'pointing' && !dragged(start, p)) return;
      phase = 'dragging';
      const along: 'h' | 'v' = Math.abs(p.h - start.h) >= Math.abs(p.v - start.v) ? 'h' : 'v';
      // The far end is on the line through the start: targets must reach that line.
      const s = snapPoint(p, ctx, along === 'h' ? { v: from.v.value } : { h: from.h.value });
      const a = along === 'h' ? from.h : from.v;
      const b = along === 'h' ? s.h : s.v;
      const across = along === 'h' ? from.v.value : from.h.value;
      draft = { along, a, b, across };
      const size = profileSize(ctx.profile);
      const lo = Math.min(a.value, b.value);
      const hi = Math.max(a.value, b.value);
      o.draft = along === 'h' ? { x0: lo, x1: hi, y0: across, y1: across + size } : { x0: across, x1: across + size, y0: lo, y1: hi };
      const cues: SnapCue[] = [];
      for (const [end, at] of [
        [a, along === 'h' ? { h: a.value, v: across } : { h: across, v: a.value }],
        [b, along === 'h' ? { h: b.value, v: across } : { h: across, v: b.value }],
      ] as const) {
        if (end.target && end.target.kind !== 'grid') cues.push({ axis: along, target: end.target, ...at });
      }
      o.cues = cues;
      o.note = b.target && b.target.kind !== 'grid' ? b.target.label : null;
    },
    up(_p, ctx) {
      const d = draft;
      phase = 'idle';
      start = null;
      from = null;
      draft = null;
      clearOverlay(ctx.overlay);
      if (!d || ctx.readOnly) return;
      const [lo, hi] = d.a.value <= d.b.value ? [d.a, d.b] : [d.b, d.a];
      if (hi.value - lo.value < MIN_LENGTH_MM) return;
      const axis: Axis = d.along === 'h' ? ctx.view.h : ctx.view.v;
      const across: Axis = d.along === 'h' ? ctx.view.v : ctx.view.h;
      const role = roleOf({ axis });
      let newId = '';
      const ok = ctx.edit(`Draw ${role}`, (doc) => {
        const r = addMember(doc, {
          axis,
          profile: ctx.profile,
          start: { value: lo.value, ref: lo.ref },
          end: { value: hi.value, ref: hi.ref },
          place: { [across]: d.across, [ctx.view.depth]: ctx.depthDefault() },
        });
        newId = r.id;
        return r.doc;
      });
      if (ok && newId) ctx.select({ members: [newId], modules: [] });
    },
    cancel(ctx) {
      phase = 'idle';
      start = null;
      from = null;
      draft = null;
      clearOverlay(ctx.overlay);
    },
    cursor(_p, ctx) {
      return ctx.readOnly ? 'not-allowed' : 'crosshair';
    },
  };
}
