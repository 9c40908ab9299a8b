import { moveBay } from '@shared/editing/bays';
import { moveModules } from '@shared/editing/edits';
import type { EditOutcome } from '@shared/editing/outcome';
import type { SceneBay, ViewItem } from '@shared/editing/scene';
import { seatModule, snapModule, type ModuleSnap } from '@shared/editing/seat';
import { snapMove } from '@shared/editing/snap';
import { projectBox, screenAxis, viewDelta, type Rect2 } from '@shared/editing/views';
import { AXIS_INDEX } from '@shared/model/axis';
import type { FrameDocument } from '@shared/model/frame-document';
import type { SnapCue } from '../overlay';
import type { PointerInput, ToolContext } from './tool';

// Dragging one module on the canvas. Along its run, near a boundary between bays, it takes its bay there (the
// bays between close up and the uprights follow); over the middle of another module it swaps with it; anywhere
// else it moves across the run, its base, sides and top snapping to member faces and other modules as the engine
// seats them (snapModule), so the canvas and the report agree on what it bears on.

export type ModuleDrop =
  | { kind: 'swap'; with: string }
  | { kind: 'reorder'; bay: string; to: number; label: string }
  | { kind: 'refuse'; reason: string }
  | { kind: 'move'; dh: number; dv: number; snaps: ModuleSnap[] };

export type ModuleDragPlan = { drop: ModuleDrop; ghost: Rect2; cues: SnapCue[]; note: string | null; swapTarget: Rect2 | null };

/** Where along the run the pointer is, if this module's bay runs across the screen in this view. */
function runPlace(ctx: ToolContext, moduleIndex: number, p: PointerInput) {
  const sm = ctx.scene.modules[moduleIndex];
  const bay = sm.bay ? ctx.scene.bays.find((b) => b.id === sm.bay) : undefined;
  if (!bay) return null;
  const along = screenAxis(ctx.view, bay.axis);
  if (!along) return null;
  const bays = ctx.scene.bays.filter((b) => b.run === bay.run).sort((a, b) => a.index - b.index);
  return { bay, bays, along, at: along === 'h' ? p.h : p.v };
}

/** The boundary (0 … bays) nearest `at`: a run end, or midway between two bays (where the upright stands). */
function nearestBoundary(bays: readonly SceneBay[], at: number): { k: number; value: number } {
  let best = { k: 0, value: bays[0].start_mm };
  for (let k = 0; k <= bays.length; k++) {
    const value = k === 0 ? bays[0].start_mm : k === bays.length ? bays[k - 1].end_mm : (bays[k - 1].end_mm + bays[k].start_mm) / 2;
    if (Math.abs(value - at) < Math.abs(best.value - at)) best = { k, value };
  }
  return best;
}

/** Is `at` in the middle half of a bay (a swap there), rather than near its edges (a move between bays)? */
const inMiddle = (b: SceneBay, at: number) => at >= b.start_mm + (b.end_mm - b.start_mm) / 4 && at <= b.end_mm - (b.end_mm - b.start_mm) / 4;

export function planModuleDrag(ctx: ToolContext, item: ViewItem, start: PointerInput, p: PointerInput, snapping: boolean): ModuleDragPlan {
  const sm = ctx.scene.modules[item.index];
  const ghostAt = (dh: number, dv: number): Rect2 => ({ x0: item.x0 + dh, x1: item.x1 + dh, y0: item.y0 + dv, y1: item.y1 + dv });
  const over = ctx.items.modules.find((i) => i.id !== item.id && p.h >= i.x0 && p.h <= i.x1 && p.v >= i.y0 && p.v <= i.y1);
  const place = runPlace(ctx, item.index, p);
  const overBay = over ? ctx.scene.bays.find((b) => b.id === ctx.scene.modules[over.index].bay) : undefined;
  const overSameBay = over !== undefined && ctx.scene.modules[over.index].bay === sm.bay && sm.bay !== null;
  if (over && (!place || overSameBay || !overBay || overBay.run !== place.bay.run || inMiddle(overBay, place.at))) {
    const dh = p.h - start.h;
    const dv = p.v - start.v;
    return { drop: { kind: 'swap', with: over.id }, ghost: ghostAt(dh, dv), cues: [], note: `Swap with ${ctx.scene.modules[over.index].name}`, swapTarget: over };
  }
  if (place && !inMiddle(place.bay, place.at)) {
    const { k, value } = nearestBoundary(place.bays, place.at);
    const i = place.bay.index;
    const to = k > i ? k - 1 : k;
    if (to !== i) {
      const dh = place.along === 'h' ? value - (item.x0 + item.x1) / 2 : 0;
      const dv = place.along === 'v' ? value - (item.y0 + item.y1) / 2 : 0;
      const lo = place.along === 'h' ? item.y0 : item.x0;
      const hi = place.along === 'h' ? item.y1 : item.x1;
      const cue: SnapCue = { axis: place.along, target: { value, kind: 'bay', ref: null, from: lo, to: hi, label: 'between bays' }, h: place.along === 'h' ? value : p.h, v: place.along === 'v' ? value : p.v };
      const where = k === 0 ? 'to the start of the run' : k === place.bays.length ? 'to the end of the run' : `between bay ${k} and bay ${k + 1}`;
      const label = `Move bay ${i + 1} ${where}`;
      return { drop: { kind: 'reorder', bay: place.bay.id, to, label }, ghost: ghostAt(dh, dv), cues: [cue], note: label, swapTarget: null };
    }
    if (place.bays.length === 1 && Math.abs(place.at - (place.bay.start_mm + place.bay.end_mm) / 2) > (place.bay.end_mm - place.bay.start_mm) / 2) {
      const reason = 'This run has only one bay, so there is nowhere along it to move the bay to; add a bay first.';
      return { drop: { kind: 'refuse', reason }, ghost: ghostAt(0, 0), cues: [], note: reason, swapTarget: null };
    }
  }
  // Across the run (or anywhere, standing free): the engine's snaps for the module's faces, else the grid.
  const fixed = place ? place.along : null;
  let dh = fixed === 'h' ? 0 : p.h - start.h;
  let dv = fixed === 'v' ? 0 : p.v - start.v;
  const d = viewDelta(ctx.view, dh, dv);
  const box = { min: [...sm.box.min] as typeof sm.box.min, max: [...sm.box.max] as typeof sm.box.max };
  for (const a of ['x', 'y', 'z'] as const) {
    box.min[AXIS_INDEX[a]] += d[a];
    box.max[AXIS_INDEX[a]] += d[a];
  }
  const axes = [ctx.view.h, ctx.view.v].filter((a) => screenAxis(ctx.view, a) !== fixed);
  const snaps = snapping ? snapModule(ctx.scene, sm.id, box, ctx.snapTolMm, axes) : [];
  const cues: SnapCue[] = [];
  for (const s of snaps) {
    const on = screenAxis(ctx.view, s.axis);
    const r = projectBox(ctx.view, s.cue);
    if (on === 'h') {
      dh += s.moved_mm;
      cues.push({ axis: 'h', target: { value: r.x0, kind: s.target.kind === 'member' ? 'face' : 'module', ref: s.ref, from: r.y0, to: r.y1, label: s.label }, h: r.x0, v: p.v });
    } else if (on === 'v') {
      dv += s.moved_mm;
      cues.push({ axis: 'v', target: { value: r.y0, kind: s.target.kind === 'member' ? 'face' : 'module', ref: s.ref, from: r.x0, to: r.x1, label: s.label }, h: p.h, v: r.y0 });
    }
  }
  const grid = snapping ? ctx.gridStep : null;
  if (fixed !== 'h' && !cues.some((c) => c.axis === 'h')) dh = snapMove([], [item.x0], dh, 0, grid).delta;
  if (fixed !== 'v' && !cues.some((c) => c.axis === 'v')) dv = snapMove([], [item.y0], dv, 0, grid).delta;
  const note = cues.length > 0 ? cues.map((c) => c.target.label.charAt(0).toUpperCase() + c.target.label.slice(1)).join(' · ') : place ? 'Drop between bays to move the bay, on another module to swap' : null;
  return { drop: { kind: 'move', dh, dv, snaps }, ghost: ghostAt(dh, dv), cues, note, swapTarget: null };
}

/** The edit a module drag ends in (swaps are the caller's, since they say why in their own words). */
export function applyModuleDrop(ctx: ToolContext, moduleId: string, drop: Exclude<ModuleDrop, { kind: 'swap' }>): EditOutcome {
  const doc: FrameDocument = ctx.doc;
  if (drop.kind === 'refuse') return { ok: false, reason: drop.reason };
  if (drop.kind === 'reorder') {
    const r = moveBay(doc, drop.bay, drop.to);
    return r.ok ? { ...r, label: drop.label } : r;
  }
  const name = ctx.scene.modules.find((m) => m.id === moduleId)?.name ?? 'module';
  const moved = moveModules(doc, new Set([moduleId]), viewDelta(ctx.view, drop.dh, drop.dv));
  const seated = seatModule(moved, moduleId, drop.snaps);
  return seated.ok ? { ...seated, label: `Move ${name}` } : seated;
}
