import type { Vec3 } from '../model/axis';
import type { FrameDocument } from '../model/frame-document';
import type { Module, ModuleOption } from '../model/module';
import { diffReports, type WhatChanged } from './diff';
import { computeReport, type FrameReport } from './report';

/** The module as it would be with an option applied (fields the option leaves out stay as they are). */
export function withOption(m: Module, o: ModuleOption): Module {
  const next: Module = { ...m, mass_kg: o.mass_kg, size: o.size ?? m.size };
  if (o.contents_kg !== undefined) next.contents_kg = o.contents_kg;
  if (o.litres !== undefined) next.litres = o.litres;
  return next;
}

export type OptionResult = {
  /** null for the module as it is now; else the option's index in `options`. */
  option: number | null;
  name: string;
  module_kg: number;
  total_kg: number;
  cog_mm: Vec3 | null;
  /** The most loaded member of the frame with this option. */
  governing: { member_id: string; name: string | null; mark: string; utilisation: number; deflection_mm: number; governs: 'deflection' | 'stress' | null } | null;
  /** The most loaded of the members this module bears on. */
  bearing: { member_id: string; name: string | null; mark: string; utilisation: number; deflection_mm: number } | null;
  /** Parts against the frame as it is now (a size option re-lays the frame). */
  cut_list: Pick<WhatChanged['totals'], 'kept' | 'shorter' | 'longer' | 'new' | 'removed'> & { changed: WhatChanged['parts'] };
  /** Warnings this option raises that the frame as it is now has not. */
  new_warnings: string[];
};

function governing(r: FrameReport, only?: ReadonlySet<string>) {
  let best: FrameReport['loads']['members'][number] | null = null;
  for (const c of r.loads.members) {
    if (c.utilisation === null || (only && !only.has(c.member_id))) continue;
    if (!best || c.utilisation > (best.utilisation as number)) best = c;
  }
  if (!best) return null;
  const m = r.members.find((x) => x.id === best.member_id);
  return {
    member_id: best.member_id,
    name: m?.name ?? null,
    mark: best.mark,
    utilisation: best.utilisation as number,
    deflection_mm: Math.max(0, ...best.spans.map((s) => s.deflection_mm)),
    governs: best.governing,
  };
}

/**
 * Each alternative a module carries, side by side with the module as it is now: the frame's total mass and centre
 * of gravity, its most loaded member (utilisation and deflection), the most loaded member under this module, and
 * what the cut list would change. Pure: one report per option.
 */
export function compareModuleOptions(doc: FrameDocument, moduleId: string): OptionResult[] {
  const mod = doc.modules.find((m) => m.id === moduleId);
  if (!mod) return [];
  const now = computeReport(doc);
  const variants: { option: number | null; name: string; doc: FrameDocument; module: Module }[] = [
    { option: null, name: `${mod.name?.trim() || 'As drawn'} (as now)`, doc, module: mod },
    ...(mod.options ?? []).map((o, i) => {
      const module = withOption(mod, o);
      return { option: i, name: o.name, doc: { ...doc, modules: doc.modules.map((m) => (m.id === moduleId ? module : m)) }, module };
    }),
  ];
  const before = new Set(now.warnings.map((w) => w.message));
  return variants.map((v) => {
    const r = v.option === null ? now : computeReport(v.doc, { previous: now });
    const diff = diffReports(now, r);
    const own = new Set(r.modules.find((m) => m.id === moduleId)?.bears_on.map((c) => c.member_id) ?? []);
    const g = governing(r, own);
    return {
      option: v.option,
      name: v.name,
      module_kg: r.modules.find((m) => m.id === moduleId)?.mass_kg ?? 0,
      total_kg: r.mass.total_kg,
      cog_mm: r.mass.cog_mm,
      governing: governing(r),
      bearing: g ? { member_id: g.member_id, name: g.name, mark: g.mark, utilisation: g.utilisation, deflection_mm: g.deflection_mm } : null,
      cut_list: {
        kept: diff.totals.kept,
        shorter: diff.totals.shorter,
        longer: diff.totals.longer,
        new: diff.totals.new,
        removed: diff.totals.removed,
        changed: diff.parts.filter((p) => p.status !== 'kept'),
      },
      new_warnings: r.warnings.map((w) => w.message).filter((m) => !before.has(m)),
    };
  });
}
