import { freshId, usedIds } from '@shared/editing/ids';
import type { EditOutcome } from '@shared/editing/outcome';
import { renameDatumRefs } from '@shared/editing/references';
import { buildCabinetRun, parseCabinetSpec, type CabinetSpec } from '@shared/model/cabinet-run';
import type { FrameDocument } from '@shared/model/frame-document';

/**
 * A cabinet layout added to a frame that has members already: laid out as a run of its own, beside the frame
 * (`gap_mm` past its far end along x), with its ids and its floor, seat, top, front and back datums renamed so
 * nothing in the frame is touched or shadowed.
 */
export function addCabinetRun(doc: FrameDocument, spec: CabinetSpec, startX_mm: number): EditOutcome<{ runId: string }> {
  let parsed;
  try {
    parsed = parseCabinetSpec(spec);
  } catch (e) {
    return { ok: false, reason: e instanceof Error ? e.message : String(e) };
  }
  const used = usedIds(doc);
  const runId = freshId(used, 'run');
  const fresh = (id: string) => (used.has(id) ? freshId(used, id) : (used.add(id), id));
  const bays = parsed.bays.map((b) => ({
    ...b,
    id: freshId(used, 'bay'),
    ...(b.module ? { module: { ...b.module, id: fresh(b.module.id) } } : {}),
    ...(b.stack ? { stack: b.stack.map((m) => ({ ...m, id: fresh(m.id) })) } : {}),
  }));
  const built = buildCabinetRun({ ...parsed, runId, bays });
  const own = new Set(built.datums.map((d) => d.id));
  const rename = (id: string) => (own.has(id) ? `${runId}-${id}` : id);
  const moved = renameDatumRefs(built, rename);
  const datums = moved.datums.map((d) => ({ ...d, id: rename(d.id) }));
  const runs = moved.runs.map((r) => ({ ...r, start: { ...r.start, offset_mm: Math.round(startX_mm * 1000) / 1000 } }));
  for (const m of moved.members) {
    if (used.has(m.id)) return { ok: false, reason: `A member of the new run would take the name “${m.id}”, which the frame already uses; rename that member first.` };
  }
  return {
    ok: true,
    doc: { ...doc, datums: [...doc.datums, ...datums], members: [...doc.members, ...moved.members], modules: [...doc.modules, ...moved.modules], runs: [...doc.runs, ...runs] },
    label: `Add the cabinet run ${parsed.name}`,
    runId,
  };
}
