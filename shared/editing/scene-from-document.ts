import { moduleTitle } from '../model/module';
import type { Box } from '../engine/box';
import { profileTable } from '../engine/profile-table';
import { resolveDatums } from '../engine/resolve-datums';
import { resolveMembers } from '../engine/resolve-members';
import { resolveModules } from '../engine/resolve-modules';
import type { FrameDocument } from '../model/frame-document';
import { roleOf } from '../model/member';
import { checkReferences } from '../model/references';
import { boundsOf, type Scene, type SceneBay, type SceneMember, type SceneModule } from './scene';

/** The box `drawn` would be cut to if its ends kept the trims (or extensions) they had at `was`. */
function keepTrims(drawn: Box, was: SceneMember): Box {
  const min: [number, number, number] = [0, 0, 0];
  const max: [number, number, number] = [0, 0, 0];
  for (let k = 0; k < 3; k++) {
    min[k] = drawn.min[k] + (was.box.min[k] - was.drawn.min[k]);
    max[k] = drawn.max[k] + (was.box.max[k] - was.drawn.max[k]);
  }
  return { min, max };
}

/**
 * The editor's scene straight from a document, without the joints, loads and lists of the full report: what the
 * canvas draws the moment an edit is applied, while the report is worked out elsewhere. Positions are exact (the
 * engine's own resolvers); each member's ends keep the trims the last report gave them, and marks, cut lengths
 * and load colours are the last report's until the next one arrives. A new member is drawn untrimmed. Throws the
 * engine's InputError for a document whose references cannot be resolved, as the report would.
 */
export function sceneFromDocument(doc: FrameDocument, previous: Scene | null): Scene {
  checkReferences(doc);
  const profileOf = profileTable(doc);
  const datums = resolveDatums(doc);
  const geometry = resolveMembers(doc, datums, profileOf);
  const before = new Map((previous?.members ?? []).map((m) => [m.id, m]));

  const members: SceneMember[] = geometry.map((g, index) => {
    const m = g.member;
    const was = before.get(m.id);
    const same = was !== undefined && was.axis === g.axis && was.profileId === m.profile;
    const box = same ? keepTrims(g.drawn, was) : g.drawn;
    const k = ['x', 'y', 'z'].indexOf(g.axis);
    const length = box.max[k] - box.min[k];
    const wasLength = same ? was.box.max[k] - was.box.min[k] : length;
    return {
      id: m.id,
      index,
      axis: g.axis,
      role: roleOf(m),
      box,
      drawn: g.drawn,
      profileId: m.profile,
      profileName: g.info.name,
      slot_mm: g.info.profile.slot_mm,
      mark: same ? was.mark : null,
      title: was?.title ?? (m.name?.trim() || roleOf(m)),
      cutLength_mm: same ? was.cutLength_mm + (length - wasLength) : length,
      utilisation: same ? was.utilisation : null,
    };
  });

  const runOfBay = new Map<string, string>();
  const bays: SceneBay[] = [...datums.bays.values()].map((b) => {
    runOfBay.set(b.bay.id, b.run.id);
    return { id: b.bay.id, run: b.run.id, axis: b.run.axis, index: b.index, start_mm: b.start_mm, end_mm: b.end_mm, module: b.bay.module ?? null };
  });
  const modules: SceneModule[] = resolveModules(doc, datums, geometry, (g) => members[g.index].box).map((g, index) => ({
    id: g.module.id,
    index,
    name: moduleTitle(g.module),
    kind: g.module.kind,
    box: g.box,
    mass_kg: g.mass_kg,
    bay: g.bay,
    run: g.bay ? (runOfBay.get(g.bay) ?? null) : null,
  }));

  return {
    members,
    modules,
    bays,
    bounds: boundsOf([...members.map((m) => m.box), ...modules.map((m) => m.box)]),
    cog: previous?.cog ?? null,
  };
}
