import { moduleTitle } from '../model/module';
import type { Box } from '../engine/box';
import type { FrameReport } from '../engine/report';
import { profileTable } from '../engine/profile-table';
import { resolveDatums } from '../engine/resolve-datums';
import { resolveMembers } from '../engine/resolve-members';
import type { Vec3 } from '../model/axis';
import type { FrameDocument } from '../model/frame-document';
import { InputError } from '../errors';
import { sheetGoods, type GoodsBox, type SheetGoods } from '../panels/sheet-goods';
import { goodsOptionsOf } from '../panels/goods-options';
import { boundsOf, type Scene, type SceneBay, type SceneGoods, type SceneMember, type SceneModule } from './scene';

const toBox = (min: Vec3, max: Vec3): Box => ({ min: [min.x, min.y, min.z], max: [max.x, max.y, max.z] });
const toSceneGoods = (b: GoodsBox): SceneGoods => ({ id: b.id, kind: b.kind, box: toBox(b.min_mm, b.max_mm) });

/**
 * The editor's scene from the engine's report. The report gives each member as cut; end handles and snapping also
 * need where the references put it before joints, which the engine's own resolver gives (called here, not
 * re-implemented).
 */
export function sceneFromReport(doc: FrameDocument, report: FrameReport, sheetGoodsOf?: SheetGoods | null): Scene {
  const profileOf = profileTable(doc);
  const datums = resolveDatums(doc);
  const drawn = resolveMembers(doc, datums, profileOf);
  const utilisation = new Map(report.loads.members.map((c) => [c.member_id, c.utilisation]));
  const runOfBay = new Map(report.bays.map((b) => [b.id, b.run_id]));
  const runAxis = new Map(doc.runs.map((r) => [r.id, r.axis]));

  const members: SceneMember[] = report.members.map((m, index) => {
    const info = profileOf(m.profile);
    return {
      id: m.id,
      index,
      axis: m.axis,
      role: m.role,
      box: toBox(m.min_mm, m.max_mm),
      drawn: drawn[index]?.drawn ?? toBox(m.min_mm, m.max_mm),
      profileId: m.profile,
      profileName: m.profile_name,
      slot_mm: info.profile.slot_mm,
      mark: m.mark,
      title: m.title,
      cutLength_mm: m.cut_length_mm,
      utilisation: utilisation.get(m.id) ?? null,
    };
  });
  const modules: SceneModule[] = report.modules.map((m, index) => ({
    id: m.id,
    index,
    name: moduleTitle({ name: m.name ?? undefined, kind: m.kind }),
    kind: m.kind,
    box: toBox(m.min_mm, m.max_mm),
    mass_kg: m.mass_kg,
    bay: m.bay_id,
    run: m.bay_id ? (runOfBay.get(m.bay_id) ?? null) : null,
  }));
  const bays: SceneBay[] = report.bays.map((b) => ({
    id: b.id,
    run: b.run_id,
    axis: runAxis.get(b.run_id) ?? 'x',
    index: b.index,
    start_mm: b.start_mm,
    end_mm: b.end_mm,
    module: b.module_id,
  }));
  return {
    members,
    modules,
    bays,
    goods: sheetGoodsOf === undefined ? goodsOf(doc, report) : (sheetGoodsOf?.boxes ?? []).map(toSceneGoods),
    bounds: boundsOf([...members.map((m) => m.box), ...modules.map((m) => m.box)]),
    cog: report.mass.cog_mm,
  };
}

/** The frame's drawers, panels and countertop, for drawing; none where they cannot be sized. */
function goodsOf(doc: FrameDocument, report: FrameReport): SceneGoods[] {
  if (!report.bays.length) return [];
  try {
    return sheetGoods(report, goodsOptionsOf(doc)).boxes.map(toSceneGoods);
  } catch (err) {
    if (err instanceof InputError) return [];
    throw err;
  }
}
