import { InputError } from '../errors';
import type { Axis } from '../model/axis';
import type { FrameDocument } from '../model/frame-document';
import type { Module } from '../model/module';
import { bayModuleIds, type Bay, type Run } from '../model/run';

/** A datum as the resolver sees it: another datum (or the origin) plus a constant, and where it was defined. */
type Node = { id: string; axis: Axis; base: string | undefined; offset: number; field: string };

const SIZE_OF_AXIS = { x: 'w', y: 'd', z: 'h' } as const;

export function moduleSizeAlong(m: Module, axis: Axis): number {
  const s = m.size;
  return { w: s.w_mm, d: s.d_mm, h: s.h_mm }[SIZE_OF_AXIS[axis]];
}

export type BayLayout = { run: Run; bay: Bay; index: number; start_mm: number; end_mm: number; width_mm: number; clearance_mm: number };

export type ResolvedDatums = {
  values: Map<string, number>;
  axes: Map<string, Axis>;
  /** Each bay's opening, by bay id. */
  bays: Map<string, BayLayout>;
  /** The bay holding each module, by module id. */
  bayOfModule: Map<string, BayLayout>;
};

function bayWidth(run: Run, bay: Bay, modules: Map<string, Module>): { width: number; clearance: number } {
  const clearance = bay.clearance_mm ?? run.clearance_mm;
  if (bay.width_mm !== undefined) return { width: bay.width_mm, clearance };
  // A stack is as wide as its widest module.
  let widest = 0;
  for (const id of bayModuleIds(bay)) widest = Math.max(widest, moduleSizeAlong(modules.get(id) as Module, run.axis));
  return { width: widest + 2 * clearance, clearance };
}

/**
 * Every datum's value. Each datum is another datum (or the origin) plus a constant, so the datums form chains;
 * following each chain once, in order, resolves them all. A chain that comes back on itself is a cycle: rejected,
 * naming the datums in it.
 */
export function resolveDatums(doc: Pick<FrameDocument, 'datums' | 'runs' | 'modules'>): ResolvedDatums {
  const modules = new Map(doc.modules.map((m) => [m.id, m]));
  const nodes = new Map<string, Node>();
  doc.datums.forEach((d, i) => {
    let offset = d.offset_mm;
    for (const t of d.plus) {
      const m = modules.get(t.module);
      if (!m) throw new InputError(`datums[${i}].plus`, `datums[${i}].plus: no module "${t.module}"`);
      offset += t.factor * { w: m.size.w_mm, d: m.size.d_mm, h: m.size.h_mm }[t.size];
    }
    nodes.set(d.id, { id: d.id, axis: d.axis, base: d.from, offset, field: `datums[${i}]` });
  });
  const widths = new Map<string, { width: number; clearance: number }>();
  doc.runs.forEach((run, i) => {
    const field = `runs[${i}]`;
    const add = (id: string, base: string | undefined, offset: number) => nodes.set(id, { id, axis: run.axis, base, offset, field });
    add(`${run.id}.u0`, run.start.datum, run.start.offset_mm);
    run.bays.forEach((bay, k) => {
      const w = bayWidth(run, bay, modules);
      widths.set(bay.id, w);
      add(`${bay.id}.start`, `${run.id}.u${k}`, run.upright_mm);
      add(`${bay.id}.mid`, `${bay.id}.start`, w.width / 2);
      add(`${bay.id}.end`, `${bay.id}.start`, w.width);
      add(`${run.id}.u${k + 1}`, `${bay.id}.end`, 0);
    });
    add(`${run.id}.end`, `${run.id}.u${run.bays.length}`, run.upright_mm);
  });

  const values = new Map<string, number>();
  const axes = new Map<string, Axis>();
  for (const n of nodes.values()) axes.set(n.id, n.axis);
  for (const start of nodes.keys()) {
    if (values.has(start)) continue;
    // Walk down the chain to something known (or the origin), then fill values back up it.
    const chain: Node[] = [];
    const onChain = new Set<string>();
    let id: string | undefined = start;
    while (id !== undefined && !values.has(id)) {
      const node = nodes.get(id);
      if (!node) {
        const last = chain[chain.length - 1];
        throw new InputError(last.field, `${last.field}: no datum "${id}"`);
      }
      if (onChain.has(id)) {
        const from = chain.findIndex((n) => n.id === id);
        const names = [...chain.slice(from).map((n) => n.id), id];
        throw new InputError(node.field, `${node.field}: datums refer to each other in a circle: ${names.join(' → ')}`);
      }
      chain.push(node);
      onChain.add(id);
      id = node.base;
    }
    let v = id === undefined ? 0 : (values.get(id) as number);
    for (let k = chain.length - 1; k >= 0; k--) {
      v += chain[k].offset;
      values.set(chain[k].id, v);
    }
  }

  const bays = new Map<string, BayLayout>();
  const bayOfModule = new Map<string, BayLayout>();
  for (const run of doc.runs) {
    run.bays.forEach((bay, index) => {
      const start = values.get(`${bay.id}.start`) as number;
      const w = widths.get(bay.id) as { width: number; clearance: number };
      const layout: BayLayout = { run, bay, index, start_mm: start, end_mm: start + w.width, width_mm: w.width, clearance_mm: w.clearance };
      bays.set(bay.id, layout);
      for (const id of bayModuleIds(bay)) bayOfModule.set(id, layout);
    });
  }
  return { values, axes, bays, bayOfModule };
}
