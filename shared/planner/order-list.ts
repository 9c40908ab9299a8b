// The grouped order list for one profile: stock bars to buy (and offcuts to take from the shelf) from a plan, beside
// the alternative of ordering the parts cut to length by a supplier for a fee per cut.
import type { CutJob } from './job';
import type { CutPlan } from './plan';

export interface OrderLine {
  stockLength: number;
  stockLabel?: string;
  qty: number;
  unitPrice: number;
  cost: number;
  /** Taken from stock on hand (limited quantity at no price) rather than bought. */
  onHand: boolean;
}

export interface CutToLengthLine {
  length: number;
  qty: number;
  labels: string[];
  cost: number;
}

export interface OrderList {
  profile: string;
  stock: { lines: OrderLine[]; barsToBuy: number; cost: number };
  cutToLength: { lines: CutToLengthLine[]; cuts: number; pricePerMetre: number; cutFee: number; cost: number };
}

export interface OrderListOptions {
  /** Supplier's fee per cut part. */
  cutFee: number;
  /** Supplier's price per metre of cut-to-length profile; by default that of the cheapest priced stock bar. */
  pricePerMetre?: number;
}

const money = (v: number): number => Math.round(v * 100) / 100;

export function orderList(profile: string, job: CutJob, plan: CutPlan, opts: OrderListOptions): OrderList {
  const groups = new Map<number, OrderLine>();
  for (const bar of plan.bars) {
    const s = job.stock[bar.stockIndex];
    const onHand = s.qty !== null && s.qty !== undefined && (s.price ?? 0) === 0;
    const line = groups.get(bar.stockIndex) ?? {
      stockLength: s.length,
      ...(s.label ? { stockLabel: s.label } : {}),
      qty: 0,
      unitPrice: s.price ?? 0,
      cost: 0,
      onHand,
    };
    line.qty++;
    line.cost = money(line.qty * line.unitPrice);
    groups.set(bar.stockIndex, line);
  }
  const lines = [...groups.values()].sort((a, b) => Number(a.onHand) - Number(b.onHand) || b.stockLength - a.stockLength);

  const priced = job.stock.filter((s) => (s.price ?? 0) > 0);
  const perMetre =
    opts.pricePerMetre ?? (priced.length ? Math.min(...priced.map((s) => ((s.price ?? 0) / s.length) * 1000)) : 0);
  const byLength = new Map<number, CutToLengthLine>();
  for (const p of job.parts) {
    if (p.qty <= 0) continue;
    const line = byLength.get(p.length) ?? { length: p.length, qty: 0, labels: [], cost: 0 };
    line.qty += p.qty;
    const label = p.label ?? '';
    if (label && !line.labels.includes(label)) line.labels.push(label);
    line.cost = money(line.qty * ((p.length / 1000) * perMetre + opts.cutFee));
    byLength.set(p.length, line);
  }
  const ctl = [...byLength.values()].sort((a, b) => b.length - a.length);
  const cuts = ctl.reduce((s, l) => s + l.qty, 0);
  return {
    profile,
    stock: {
      lines,
      barsToBuy: lines.filter((l) => !l.onHand).reduce((s, l) => s + l.qty, 0),
      cost: money(lines.reduce((s, l) => s + l.cost, 0)),
    },
    cutToLength: {
      lines: ctl,
      cuts,
      pricePerMetre: money(perMetre),
      cutFee: opts.cutFee,
      cost: money(ctl.reduce((s, l) => s + l.cost, 0)),
    },
  };
}
