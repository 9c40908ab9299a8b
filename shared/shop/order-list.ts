import { orderList as plannerOrderList, type CutJob, type CutPlan } from '../planner';
import { lengthText, type Readout } from '../display/format';
import type { ConsideredBar, OrderList } from './types';

/** One profile's job and plan as the planner took and gave them, with the supplier's bars it was offered. */
export type PlannedProfile = { profileId: string; profileName: string; job: CutJob; plan: CutPlan; considered?: ConsideredBar[] };

/** Which of the offered bars the plan buys, and on what grounds. */
export function explainChoice(p: PlannedProfile, units?: Readout): { considered: ConsideredBar[]; choice: string } {
  const considered = (p.considered ?? []).map((c) => ({
    ...c,
    used: c.offered ? p.plan.bars.filter((b) => b.stock === c.length_mm && b.price === c.price && !isOnHand(p.job, b.stockIndex)).length : 0,
  }));
  const offered = considered.filter((c) => c.offered);
  const bought = offered.filter((c) => c.used > 0).map((c) => `${c.used} × ${units ? lengthText(c.length_mm, units) : `${c.length_mm} mm`} at ${c.price}`);
  const basis = p.plan.optimal
    ? 'the least cost, then the fewest bars, then the least waste, proven'
    : `the least cost found in the time allowed (at most ${Math.round(p.plan.gap * 1000) / 10} % above the bound)`;
  const choice =
    offered.length === 0
      ? 'No supplier bars were offered.'
      : `${offered.length} bar length${offered.length > 1 ? 's' : ''} offered to the planner; it buys ${bought.length ? bought.join(' + ') : 'none (offcuts on hand suffice)'}: ${basis}.`;
  return { considered, choice };
}

const isOnHand = (job: CutJob, i: number): boolean => job.stock[i]?.qty !== null && job.stock[i]?.qty !== undefined && (job.stock[i]?.price ?? 0) === 0;

/** A supplier's terms for parts cut to length: a fee per cut, and a price per metre (else the cheapest bar's). */
export type CutToLengthTerms = { cutFee: number; pricePerMetre?: Readonly<Record<string, number>> };

const money = (v: number): number => Math.round(v * 100) / 100;

/**
 * The order list across profiles: the stock planner's grouped order list for each profile (bars by length with
 * cost, and the same parts bought cut to length), with totals so the two ways of buying can be compared.
 */
/** `units`: the frame's readout, for the lengths in the words that explain the choice of bars. */
export function orderList(profiles: readonly PlannedProfile[], currency: string, terms: CutToLengthTerms, units?: Readout): OrderList {
  const out = profiles.map((p) => ({
    profileId: p.profileId,
    profileName: p.profileName,
    order: plannerOrderList(p.profileId, p.job, p.plan, { cutFee: terms.cutFee, pricePerMetre: terms.pricePerMetre?.[p.profileId] }),
    ...(p.considered ? explainChoice(p, units) : {}),
  }));
  return {
    currency,
    profiles: out,
    barsToBuy: out.reduce((n, p) => n + p.order.stock.barsToBuy, 0),
    stockTotal: money(out.reduce((s, p) => s + p.order.stock.cost, 0)),
    cutCount: out.reduce((n, p) => n + p.order.cutToLength.cuts, 0),
    cutToLengthTotal: money(out.reduce((s, p) => s + p.order.cutToLength.cost, 0)),
  };
}

export type OrderMode = 'stock' | 'cut-to-length';

/**
 * The order as plain text: the chosen way of buying, then (for the shop's own view) the other way for
 * comparison. With `comparison: false` it is what the supplier gets: only what they are asked to supply, not
 * what the shop weighed it against.
 */
export function orderText(
  order: OrderList,
  mode: OrderMode,
  f: { lengthText: (mm: number) => string; money: (v: number) => string; heading: string; comparison?: boolean },
): string {
  const stock: string[] = ['Stock bars to buy:'];
  for (const p of order.profiles) {
    for (const l of p.order.stock.lines) {
      if (l.onHand) continue;
      stock.push(`  ${l.qty} × ${p.profileName}, ${f.lengthText(l.stockLength)} bars at ${f.money(l.unitPrice)} each = ${f.money(l.cost)}`);
    }
  }
  if (stock.length === 1) stock.push('  (none: everything comes from offcuts on hand)');
  stock.push(`  Total: ${f.money(order.stockTotal)}`);
  const cut: string[] = ['Parts cut to length:'];
  for (const p of order.profiles) {
    for (const l of p.order.cutToLength.lines) cut.push(`  ${l.qty} × ${p.profileName} cut to ${f.lengthText(l.length)} (part marks ${l.labels.join(', ')})`);
  }
  cut.push(`  ${order.cutCount} cuts; total with cutting fees: ${f.money(order.cutToLengthTotal)}`);
  const [first, second] = mode === 'stock' ? [stock, cut] : [cut, stock];
  if (f.comparison === false) return [f.heading, '', ...first].join('\n');
  second[0] = mode === 'stock' ? 'For comparison, the same parts cut to length:' : 'For comparison, as stock bars:';
  return [f.heading, '', ...first, '', ...second].join('\n');
}
