import type { Box } from '../engine/box';
import type { Axis, Vec3 } from '../model/axis';
import type { MemberRole } from '../model/member';
import type { ModuleKind } from '../model/module';
import { projectBox, type Projected, type Rect2, type ViewDef } from './views';

/** A member as the editor draws it: resolved geometry and the facts shown on it. */
export type SceneMember = {
  id: string;
  index: number;
  axis: Axis;
  role: MemberRole;
  /** As cut: ends trimmed or carried to the faces they meet. */
  box: Box;
  /** Where its references put it, before joints (what end handles move). */
  drawn: Box;
  profileId: string;
  profileName: string;
  /** Slot opening (mm) for drawing the slot; null for plain sections. */
  slot_mm: number | null;
  mark: string | null;
  /** How the builder knows it ("rail C (top rail)"), never the record id. */
  title: string;
  cutLength_mm: number;
  /** Highest ratio of a load check to its limit; null when nothing loads it. */
  utilisation: number | null;
};

export type SceneModule = {
  id: string;
  index: number;
  name: string;
  kind: ModuleKind;
  box: Box;
  mass_kg: number;
  bay: string | null;
  run: string | null;
};

/** A bay's opening along its run, for snapping and labels. */
export type SceneBay = { id: string; run: string; axis: Axis; index: number; start_mm: number; end_mm: number; module: string | null };

/** What the canvas needs from one run of the engine. */
/** A drawer box, panel or countertop the sheet goods put in a bay: drawn thin and translucent, never picked. */
export type SceneGoods = { id: string; kind: 'drawer' | 'panel' | 'top'; box: Box };

export type Scene = {
  members: SceneMember[];
  modules: SceneModule[];
  bays: SceneBay[];
  /** Absent on scenes built without a report (hand-made test scenes, layout previews). */
  goods?: SceneGoods[];
  /** Everything drawn (members and modules); null for an empty frame. */
  bounds: Box | null;
  cog: Vec3 | null;
};

export const emptyScene = (): Scene => ({ members: [], modules: [], bays: [], goods: [], bounds: null, cog: null });

export function boundsOf(boxes: readonly Box[]): Box | null {
  if (boxes.length === 0) return null;
  const b: Box = { min: [Infinity, Infinity, Infinity], max: [-Infinity, -Infinity, -Infinity] };
  for (const x of boxes) {
    for (let k = 0; k < 3; k++) {
      if (x.min[k] < b.min[k]) b.min[k] = x.min[k];
      if (x.max[k] > b.max[k]) b.max[k] = x.max[k];
    }
  }
  return b;
}

export type ItemKind = 'member' | 'module';
/** A member or module projected into a view, in drawing order (far first). */
export type ViewItem = Projected & { kind: ItemKind; id: string; index: number };

/** Members and modules of a scene as seen in a view, sorted far to near (draw in order, hit-test in reverse). */
export function projectScene(scene: Scene, view: ViewDef): { members: ViewItem[]; modules: ViewItem[] } {
  const members = scene.members.map((m) => ({ ...projectBox(view, m.box), kind: 'member' as const, id: m.id, index: m.index }));
  const modules = scene.modules.map((m) => ({ ...projectBox(view, m.box), kind: 'module' as const, id: m.id, index: m.index }));
  const byDepth = (a: ViewItem, b: ViewItem) => a.near - b.near || a.index - b.index;
  members.sort(byDepth);
  modules.sort(byDepth);
  return { members, modules };
}

export function viewBounds(scene: Scene, view: ViewDef): Rect2 | null {
  return scene.bounds ? projectBox(view, scene.bounds) : null;
}
