import { diffDocuments } from '@shared/editing/change';
import { moveMembers, moveModules, stretchMember } from '@shared/editing/edits';
import { boxSelect, hitEndHandle, hitItem } from '@shared/editing/hit-test';
import type { SceneMember, ViewItem } from '@shared/editing/scene';
import { snapMove, snapValue, type SnapTarget } from '@shared/editing/snap';
import { screenAxis, viewDelta, type Rect2 } from '@shared/editing/views';
import { HANDLE_PX } from '../draw/overlay';
import { swapPicked } from '../module-moves';
import { applyModuleDrop, planModuleDrag, type ModuleDrop } from './module-drag';
import type { SnapCue } from '../overlay';
import { clearOverlay, dragged, type Phase, type PointerInput, type Tool, type ToolContext } from './tool';

type Gesture =
  | { mode: 'move'; start: PointerInput; rects: Rect2[]; members: Set<string>; modules: Set<string> }
  | { mode: 'stretch'; start: PointerInput; member: SceneMember; item: ViewItem; which: 'start' | 'end'; along: 'h' | 'v' }
  | { mode: 'module'; start: PointerInput; item: ViewItem }
  | { mode: 'box'; start: PointerInput; additive: boolean };

const HIT_PAD_PX = 5;

/** Ids of the selected members and modules as sets. */
function selected(ctx: ToolContext): { members: Set<string>; modules: Set<string> } {
  return { members: new Set(ctx.selection.members), modules: new Set(ctx.selection.modules) };
}

/**
 * Pick, box-select, move, stretch by end handles, and drag a module (see module-drag: onto another to swap them,
 * between bays to reorder the run, elsewhere to seat it). The drag shows a
 * ghost on the overlay; the document changes once, on release (one undo step).
 */
export function createSelectTool(): Tool {
  let phase: Phase = 'idle';
  let g: Gesture | null = null;
  let result: { dh: number; dv: number; value?: number; target?: SnapTarget | null } = { dh: 0, dv: 0 };
  let drop: ModuleDrop | null = null;

  const padMm = (ctx: ToolContext, px: number) => px / ctx.cam.scale;

  function pickHandle(p: PointerInput, ctx: ToolContext): Gesture | null {
    if (ctx.readOnly || ctx.selection.members.length !== 1 || ctx.selection.modules.length > 0) return null;
    const id = ctx.selection.members[0];
    const item = ctx.items.members.find((i) => i.id === id);
    if (!item) return null;
    const member = ctx.scene.members[item.index];
    const along = screenAxis(ctx.view, member.axis);
    if (!along) return null;
    const which = hitEndHandle(item, along, p.h, p.v, padMm(ctx, HANDLE_PX));
    return which ? { mode: 'stretch', start: p, member, item, which, along } : null;
  }

  return {
    id: 'select',
    get phase() {
      return phase;
    },

    down(p, ctx) {
      result = { dh: 0, dv: 0 };
      drop = null;
      phase = 'pointing';
      g = pickHandle(p, ctx);
      if (g) return;
      const pad = padMm(ctx, HIT_PAD_PX);
      const member = hitItem(ctx.items.members, p.h, p.v, pad);
      const module = member ? null : hitItem(ctx.items.modules, p.h, p.v, 0);
      const hit = member ?? module;
      if (!hit) {
        g = { mode: 'box', start: p, additive: p.shift };
        return;
      }
      const sel = selected(ctx);
      const set = hit.kind === 'member' ? sel.members : sel.modules;
      if (p.shift) {
        if (set.has(hit.id)) set.delete(hit.id);
        else set.add(hit.id);
      } else if (!set.has(hit.id)) {
        sel.members.clear();
        sel.modules.clear();
        set.add(hit.id);
      }
      ctx.select({ members: [...sel.members], modules: [...sel.modules] });
      if (ctx.readOnly || !set.has(hit.id)) {
        g = null;
        return;
      }
      if (hit.kind === 'module' && sel.members.size === 0 && sel.modules.size === 1) {
        g = { mode: 'module', start: p, item: hit };
        return;
      }
      const rects = [
        ...ctx.items.members.filter((i) => sel.members.has(i.id)),
        ...ctx.items.modules.filter((i) => sel.modules.has(i.id)),
      ];
      g = { mode: 'move', start: p, rects, members: sel.members, modules: sel.modules };
    },

    move(p, ctx) {
      const o = ctx.overlay;
      o.pointer = { h: p.h, v: p.v };
      if (!g || phase === 'idle') {
        o.hover = hitItem(ctx.items.members, p.h, p.v, padMm(ctx, HIT_PAD_PX)) ?? hitItem(ctx.items.modules, p.h, p.v, 0);
        return;
      }
      o.hover = null;
      if (phase === 'pointing') {
        if (!dragged(g.start, p)) return;
        phase = 'dragging';
      }
      const snapping = !p.alt;
      const tol = snapping ? ctx.snapTolMm : 0;
      const grid = snapping ? ctx.gridStep : null;
      const cues: SnapCue[] = [];
      switch (g.mode) {
        case 'box':
          o.box = { ax: g.start.h, ay: g.start.v, bx: p.h, by: p.v };
          break;
        case 'move': {
          const targets = ctx.targets(g.members);
          const edgesH: number[] = [];
          const edgesV: number[] = [];
          // Every edge of a small selection may snap; for a large one its outer box is enough.
          const sample = g.rects.length <= 40 ? g.rects : [g.rects.reduce((a, r) => ({ x0: Math.min(a.x0, r.x0), x1: Math.max(a.x1, r.x1), y0: Math.min(a.y0, r.y0), y1: Math.max(a.y1, r.y1) }))];
          for (const r of sample) edgesH.push(r.x0, r.x1), edgesV.push(r.y0, r.y1);
          const sh = snapMove(targets.h, edgesH, p.h - g.start.h, tol, grid);
          const sv = snapMove(targets.v, edgesV, p.v - g.start.v, tol, grid);
          result = { dh: sh.delta, dv: sv.delta };
          o.ghost = g.rects.map((r) => ({ x0: r.x0 + sh.delta, x1: r.x1 + sh.delta, y0: r.y0 + sv.delta, y1: r.y1 + sv.delta }));
          if (sh.target) cues.push({ axis: 'h', target: sh.target, h: sh.target.value, v: p.v });
          if (sv.target) cues.push({ axis: 'v', target: sv.target, h: p.h, v: sv.target.value });
          break;
        }
        case 'stretch': {
          const targets = ctx.targets(new Set([g.member.id]));
          const raw = g.along === 'h' ? p.h : p.v;
          const mid = g.along === 'h' ? (g.item.y0 + g.item.y1) / 2 : (g.item.x0 + g.item.x1) / 2;
          const s = snapValue(g.along === 'h' ? targets.h : targets.v, raw, tol, grid, mid);
          result = { dh: 0, dv: 0, value: s.value, target: s.target };
          const r = { ...g.item };
          const lo = g.along === 'h' ? 'x0' : 'y0';
          const hi = g.along === 'h' ? 'x1' : 'y1';
          if (g.which === 'start') r[lo] = Math.min(s.value, r[hi] - 1);
          else r[hi] = Math.max(s.value, r[lo] + 1);
          o.ghost = [r];
          if (s.target) cues.push({ axis: g.along, target: s.target, h: g.along === 'h' ? s.value : p.h, v: g.along === 'v' ? s.value : p.v });
          break;
        }
        case 'module': {
          const plan = planModuleDrag(ctx, g.item, g.start, p, snapping);
          drop = plan.drop;
          o.ghost = [plan.ghost];
          o.swapTarget = plan.swapTarget;
          o.note = plan.note;
          cues.push(...plan.cues);
          break;
        }
      }
      o.cues = cues;
      if (cues.length && !o.note) {
        const named = cues.find((c) => c.target.kind !== 'grid');
        o.note = named ? named.target.label : null;
      } else if (!cues.length && g.mode !== 'module') o.note = null;
    },

    up(p, ctx) {
      const gesture = g;
      const wasDragging = phase === 'dragging';
      phase = 'idle';
      g = null;
      clearOverlay(ctx.overlay);
      if (!gesture) return;
      if (!wasDragging) {
        // A click on empty space clears the selection (shift-click keeps it).
        if (gesture.mode === 'box' && !gesture.additive) ctx.select({ members: [], modules: [] });
        return;
      }
      switch (gesture.mode) {
        case 'box': {
          const members = boxSelect(ctx.items.members, gesture.start.h, gesture.start.v, p.h, p.v).map((i) => i.id);
          const modules = boxSelect(ctx.items.modules, gesture.start.h, gesture.start.v, p.h, p.v).map((i) => i.id);
          if (gesture.additive) {
            ctx.select({ members: [...new Set([...ctx.selection.members, ...members])], modules: [...new Set([...ctx.selection.modules, ...modules])] });
          } else ctx.select({ members, modules });
          return;
        }
        case 'move': {
          const d = viewDelta(ctx.view, result.dh, result.dv);
          if (d.x === 0 && d.y === 0 && d.z === 0) return;
          const n = gesture.members.size + gesture.modules.size;
          const label = n === 1 ? (gesture.members.size ? 'Move member' : 'Move module') : `Move ${n} items`;
          ctx.edit(label, (doc) => moveModules(moveMembers(doc, gesture.members, d), gesture.modules, d));
          return;
        }
        case 'stretch': {
          if (result.value === undefined) return;
          const ref = result.target?.ref ?? null;
          const sm = gesture.member;
          const value = result.value;
          ctx.edit(`Stretch ${sm.mark ?? sm.id}`, (doc) => stretchMember(doc, sm, gesture.which, value, ref));
          return;
        }
        case 'module': {
          const m = ctx.scene.modules[gesture.item.index];
          const d = drop;
          drop = null;
          if (!d) return;
          const r = d.kind === 'swap' ? swapPicked(ctx.doc, ctx.scene, [m.id, d.with]) : applyModuleDrop(ctx, m.id, d);
          const what = d.kind === 'swap' ? 'Swap modules' : d.kind === 'move' ? `Move ${m.name}` : 'Move bay';
          if (!r.ok) ctx.refuse?.(what, r.reason);
          else if (r.doc !== ctx.doc) ctx.apply(diffDocuments(ctx.doc, r.doc, r.label), { summarise: d.kind !== 'move' });
          return;
        }
      }
    },

    cancel(ctx) {
      phase = 'idle';
      g = null;
      clearOverlay(ctx.overlay);
    },

    cursor(p, ctx) {
      if (phase === 'dragging') return g?.mode === 'box' ? 'crosshair' : 'grabbing';
      if (!p) return 'default';
      if (pickHandle(p, ctx)) {
        const id = ctx.selection.members[0];
        const m = ctx.scene.members.find((x) => x.id === id);
        return m && screenAxis(ctx.view, m.axis) === 'h' ? 'ew-resize' : 'ns-resize';
      }
      const hit = hitItem(ctx.items.members, p.h, p.v, padMm(ctx, HIT_PAD_PX)) ?? hitItem(ctx.items.modules, p.h, p.v, 0);
      return hit && !ctx.readOnly ? 'move' : hit ? 'pointer' : 'default';
    },
  };
}
