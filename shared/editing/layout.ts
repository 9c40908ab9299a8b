import { moduleTitle } from '../model/module';
import type { Box } from '../engine/box';
import { profileTable } from '../engine/profile-table';
import { resolveDatums, type ResolvedDatums } from '../engine/resolve-datums';
import { resolveMembers } from '../engine/resolve-members';
import { resolveModules } from '../engine/resolve-modules';
import { roleOf } from '../model/member';
import type { FrameDocument } from '../model/frame-document';
import { boundsOf, type Scene } from './scene';

export type Layout = { scene: Scene; datums: ResolvedDatums };

/**
 * Where the references put everything, without the rest of the report (joints, loads): what an edit needs to
 * pin a position or to read a bay's width. Members are boxes as drawn (before joints trim their ends), so faces
 * are the ones the references name.
 */
export function layoutOf(doc: FrameDocument): Layout {
  const profileOf = profileTable(doc);
  const datums = resolveDatums(doc);
  const members = resolveMembers(doc, datums, profileOf);
  const modules = resolveModules(doc, datums, members, (m) => m.drawn);
  const runOfBay = new Map<string, string>();
  for (const r of doc.runs) for (const b of r.bays) runOfBay.set(b.id, r.id);
  const scene: Scene = {
    members: members.map((g) => ({
      id: g.member.id,
      index: g.index,
      axis: g.axis,
      role: roleOf(g.member),
      box: g.drawn,
      drawn: g.drawn,
      profileId: g.member.profile,
      profileName: g.info.name,
      slot_mm: g.info.profile.slot_mm,
      mark: g.member.mark ?? null,
      title: g.member.name?.trim() || roleOf(g.member),
      cutLength_mm: 0,
      utilisation: null,
    })),
    modules: modules.map((g) => ({
      id: g.module.id,
      index: g.index,
      name: moduleTitle(g.module),
      kind: g.module.kind,
      box: g.box,
      mass_kg: g.mass_kg,
      bay: g.bay,
      run: g.bay ? (runOfBay.get(g.bay) ?? null) : null,
    })),
    bays: [...datums.bays.values()].map((b) => ({
      id: b.bay.id,
      run: b.run.id,
      axis: b.run.axis,
      index: b.index,
      start_mm: b.start_mm,
      end_mm: b.end_mm,
      module: b.bay.module ?? null,
    })),
    bounds: null,
    cog: null,
  };
  scene.bounds = boundsOf([...scene.members.map((m) => m.box), ...scene.modules.map((m) => m.box)] as Box[]);
  return { scene, datums };
}
