import { resolveProfile } from '../catalog/profiles';
import type { DatumInput } from './datum';
import { CURRENT_SCHEMA_VERSION, frameDocumentSchema, type FrameDocument, type FrameDocumentInput } from './frame-document';
import type { MemberInput } from './member';
import type { Bearing, ModuleInput, ModuleKind } from './module';
import type { PositionInput } from './position';

/** A module as a cabinet run holds it, in its own bay. */
export type CabinetModule = {
  id: string;
  name: string;
  kind: ModuleKind;
  bearing: Extract<Bearing, 'base' | 'side-rails'>;
  size: { w_mm: number; d_mm: number; h_mm: number };
  mass_kg: number;
  contents_kg?: number;
  litres?: number;
  /** Height of the module's base above the seat (side-rail modules slide at any height). */
  raise_mm?: number;
};

export type CabinetBay = { id: string; module?: CabinetModule; width_mm?: number; clearance_mm?: number };

export type CabinetSpec = {
  name: string;
  runId?: string;
  profile: string;
  depth_mm: number;
  height_mm: number;
  /** Height of the seat: the top of the bottom rails and bearers that base modules stand on. */
  seat_mm: number;
  clearance_mm: number;
  bays: CabinetBay[];
  settings?: FrameDocumentInput['settings'];
  units?: FrameDocumentInput['units'];
};

const at = (datum: string, align?: 'min' | 'center' | 'max', offset_mm = 0): PositionInput => ({ datum, offset_mm, ...(align ? { align } : {}) });

/**
 * A cabinet run laid out by reference: an upright pair (front and back) at every bay boundary, rails front and
 * back at the top and at the seat in every bay, cross-members at every upright pair top and bottom, two bearers
 * under each base module and a side rail either side of each side-rail module (in line with the uprights). Bay
 * members refer to their bay's datums, so they travel with the bay when modules are swapped; uprights and
 * cross-members refer to the run's upright datums, so they move to the new boundaries.
 */
export function buildCabinetRun(spec: CabinetSpec): FrameDocument {
  const run = spec.runId ?? 'run';
  const p = resolveProfile(spec.profile);
  const t = Math.min(p.width_mm, p.height_mm);
  const datums: DatumInput[] = [
    { type: 'datum', id: 'floor', name: 'Floor', axis: 'z' },
    { type: 'datum', id: 'seat', name: 'Seat (top of the bottom rails)', axis: 'z', from: 'floor', offset_mm: spec.seat_mm },
    { type: 'datum', id: 'top', name: 'Top of the frame', axis: 'z', from: 'floor', offset_mm: spec.height_mm },
    { type: 'datum', id: 'front', name: 'Front face', axis: 'y' },
    { type: 'datum', id: 'back', name: 'Back face', axis: 'y', from: 'front', offset_mm: spec.depth_mm },
  ];
  const members: MemberInput[] = [];
  const modules: ModuleInput[] = [];
  const member = (id: string, axis: 'x' | 'y' | 'z', start: PositionInput, end: PositionInput, place: MemberInput['place'], name: string) =>
    members.push({ type: 'member', id, name, profile: spec.profile, axis, start, end, place });
  const frontY = at('front');
  const backY = at('back', 'max');
  const inFront = at('front', undefined, t);
  const inBack = at('back', undefined, -t);

  for (let k = 0; k <= spec.bays.length; k++) {
    const x = at(`${run}.u${k}`);
    member(`${run}-u${k}-f`, 'z', at('floor'), at('top'), { x, y: frontY }, `Upright ${k + 1}, front`);
    member(`${run}-u${k}-b`, 'z', at('floor'), at('top'), { x, y: backY }, `Upright ${k + 1}, back`);
    member(`${run}-x${k}-top`, 'y', inFront, inBack, { x, z: at('top', 'max') }, `Cross-member ${k + 1}, top`);
    member(`${run}-x${k}-low`, 'y', inFront, inBack, { x, z: at('seat', 'max') }, `Cross-member ${k + 1}, seat`);
  }
  for (const bay of spec.bays) {
    const s = at(`${bay.id}.start`);
    const e = at(`${bay.id}.end`);
    member(`${bay.id}-top-f`, 'x', s, e, { y: frontY, z: at('top', 'max') }, `${bay.id}: top rail, front`);
    member(`${bay.id}-top-b`, 'x', s, e, { y: backY, z: at('top', 'max') }, `${bay.id}: top rail, back`);
    member(`${bay.id}-low-f`, 'x', s, e, { y: frontY, z: at('seat', 'max') }, `${bay.id}: seat rail, front`);
    member(`${bay.id}-low-b`, 'x', s, e, { y: backY, z: at('seat', 'max') }, `${bay.id}: seat rail, back`);
    const m = bay.module;
    if (!m) continue;
    const clearance = bay.clearance_mm ?? spec.clearance_mm;
    const z = at('seat', undefined, m.raise_mm ?? 0);
    if (m.bearing === 'base') {
      // Bearers under the module's sides, set in from its edges by a quarter of the profile.
      const inset = clearance + t / 4;
      member(`${bay.id}-bearer-l`, 'y', inFront, inBack, { x: at(`${bay.id}.start`, 'min', inset), z: at('seat', 'max') }, `${bay.id}: bearer, left`);
      member(`${bay.id}-bearer-r`, 'y', inFront, inBack, { x: at(`${bay.id}.end`, 'max', -inset), z: at('seat', 'max') }, `${bay.id}: bearer, right`);
    } else {
      const railZ = at('seat', 'center', (m.raise_mm ?? 0) + m.size.h_mm / 2);
      member(`${bay.id}-slide-l`, 'y', inFront, inBack, { x: at(`${bay.id}.start`, 'max'), z: railZ }, `${bay.id}: slide rail, left`);
      member(`${bay.id}-slide-r`, 'y', inFront, inBack, { x: at(`${bay.id}.end`, 'min'), z: railZ }, `${bay.id}: slide rail, right`);
    }
    modules.push({
      type: 'module',
      id: m.id,
      name: m.name,
      kind: m.kind,
      size: m.size,
      mass_kg: m.mass_kg,
      contents_kg: m.contents_kg ?? 0,
      ...(m.litres !== undefined ? { litres: m.litres } : {}),
      bearing: m.bearing,
      place: { y: inFront, z },
    });
  }
  const input: FrameDocumentInput = {
    schemaVersion: CURRENT_SCHEMA_VERSION,
    name: spec.name,
    units: spec.units,
    settings: spec.settings,
    datums,
    members,
    modules,
    runs: [
      {
        type: 'run',
        id: run,
        name: spec.name,
        axis: 'x',
        upright_mm: t,
        clearance_mm: spec.clearance_mm,
        bays: spec.bays.map((b) => ({
          id: b.id,
          ...(b.module ? { module: b.module.id } : {}),
          ...(b.width_mm !== undefined ? { width_mm: b.width_mm } : {}),
          ...(b.clearance_mm !== undefined ? { clearance_mm: b.clearance_mm } : {}),
        })),
      },
    ],
  };
  return frameDocumentSchema.parse(input);
}
