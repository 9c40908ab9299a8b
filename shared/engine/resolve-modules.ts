import { InputError } from '../errors';
import { AXES, type Axis } from '../model/axis';
import type { FrameDocument } from '../model/frame-document';
import { moduleMass_kg, type Module } from '../model/module';
import type { Position } from '../model/position';
import { ai, type Box } from './box';
import type { MemberGeometry } from './resolve-members';
import { alignedLow } from './resolve-members';
import { moduleSizeAlong, type ResolvedDatums } from './resolve-datums';

export type ModuleGeometry = { index: number; module: Module; box: Box; mass_kg: number; bay: string | null };

/**
 * Module boxes. A module in a bay sits centred in the bay's opening along the run (its clearance either side);
 * its other axes come from `place`, which may name a datum or a member face (e.g. the top of a bearer).
 */
export function resolveModules(
  doc: Pick<FrameDocument, 'modules'>,
  datums: ResolvedDatums,
  members: readonly MemberGeometry[],
  faceBox: (m: MemberGeometry) => Box,
): ModuleGeometry[] {
  const byId = new Map(members.map((m) => [m.member.id, m]));
  const value = (p: Position | undefined, axis: Axis, field: string): number => {
    if (!p) return 0;
    let base = 0;
    if (p.datum !== undefined) {
      const v = datums.values.get(p.datum);
      if (v === undefined || datums.axes.get(p.datum) !== axis) {
        throw new InputError(`${field}.datum`, `${field}.datum: no datum "${p.datum}" on the ${axis} axis`);
      }
      base = v;
    } else if (p.member !== undefined) {
      const m = byId.get(p.member);
      if (!m) throw new InputError(`${field}.member`, `${field}.member: no member "${p.member}"`);
      const b = faceBox(m);
      base = p.face === 'max' ? b.max[ai(axis)] : b.min[ai(axis)];
    }
    return base + p.offset_mm;
  };
  return doc.modules.map((module, index) => {
    const bay = datums.bayOfModule.get(module.id);
    const box: Box = { min: [0, 0, 0], max: [0, 0, 0] };
    for (const a of AXES) {
      const size = moduleSizeAlong(module, a);
      const k = ai(a);
      const low =
        bay && bay.run.axis === a
          ? bay.start_mm + (bay.width_mm - size) / 2
          : alignedLow(value(module.place[a], a, `modules[${index}].place.${a}`), size, module.place[a]?.align);
      box.min[k] = low;
      box.max[k] = low + size;
    }
    return { index, module, box, mass_kg: moduleMass_kg(module), bay: bay?.bay.id ?? null };
  });
}
