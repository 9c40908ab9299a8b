import { lengthText, opText } from './format';
import type { ShopCutList, ShopOp, ShopUnits } from './types';

export type DrillRow = { mark: string; profileName: string; qty: number; lengthText: string; steps: string[]; members: string[] };
export type DrillTotal = { what: string; count: number };
export type DrillSheet = { rows: DrillRow[]; totals: DrillTotal[] };

function totalKey(op: ShopOp): string {
  switch (op.kind) {
    case 'end-tap':
      return `End taps ${op.thread} (drill Ø${op.tapDrill_mm} mm)`;
    case 'access-hole':
      return `Access holes Ø${op.diameter_mm} mm`;
  }
}

/** Machining after the saw: each part mark that needs any, with every step, and totals per tap size and drill. */
export function drillSheet(cutList: ShopCutList, units: ShopUnits): DrillSheet {
  const rows: DrillRow[] = [];
  const totals = new Map<string, number>();
  for (const p of cutList.parts) {
    if (p.ops.length === 0) continue;
    rows.push({
      mark: p.mark,
      profileName: p.profileName,
      qty: p.qty,
      lengthText: lengthText(p.cutLength_mm, units),
      steps: p.ops.map((op) => opText(op, units)),
      members: p.members,
    });
    for (const op of p.ops) totals.set(totalKey(op), (totals.get(totalKey(op)) ?? 0) + p.qty);
  }
  rows.sort((a, b) => a.mark.length - b.mark.length || a.mark.localeCompare(b.mark));
  return { rows, totals: [...totals].map(([what, count]) => ({ what, count })).sort((a, b) => a.what.localeCompare(b.what)) };
}
