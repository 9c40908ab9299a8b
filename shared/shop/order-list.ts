import type { OrderCutLine, OrderList, OrderStockLine, ProfilePlan, ShopCutList } from './types';

/** What a supplier charges for bought-cut-to-length parts. Null figures are unknown and leave the total open. */
export type CutToLengthPricing = { feePerCut: number | null; pricePerMetre: Readonly<Record<string, number | null>> };

const money = (v: number): number => Math.round(v * 100) / 100;

/**
 * The order list: bars to buy (shelf offcuts left out) grouped by profile and stock length, and beside it the same
 * parts bought cut to length by the supplier, grouped by length, so the builder can compare the two ways of buying.
 */
export function orderList(plans: readonly ProfilePlan[], cutList: ShopCutList, currency: string, pricing: CutToLengthPricing): OrderList {
  const stock = new Map<string, OrderStockLine>();
  for (const plan of plans) {
    for (const bar of plan.bars) {
      if (bar.fromShelf) continue;
      const key = `${plan.profileId}|${bar.stock_mm}|${bar.price}`;
      const line = stock.get(key) ?? { profileId: plan.profileId, profileName: plan.profileName, length_mm: bar.stock_mm, qty: 0, unitPrice: bar.price, cost: 0 };
      line.qty++;
      line.cost = money(line.qty * line.unitPrice);
      stock.set(key, line);
    }
  }
  const stockLines = [...stock.values()].sort((a, b) => a.profileName.localeCompare(b.profileName) || b.length_mm - a.length_mm);

  const cuts = new Map<string, OrderCutLine>();
  const metres = new Map<string, { profileId: string; profileName: string; mm: number }>();
  let cutCount = 0;
  for (const p of cutList.parts) {
    const key = `${p.profileId}|${p.cutLength_mm}`;
    const line = cuts.get(key) ?? { profileId: p.profileId, profileName: p.profileName, length_mm: p.cutLength_mm, qty: 0, marks: [] };
    line.qty += p.qty;
    line.marks.push(p.mark);
    cuts.set(key, line);
    cutCount += p.qty;
    const m = metres.get(p.profileId) ?? { profileId: p.profileId, profileName: p.profileName, mm: 0 };
    m.mm += p.cutLength_mm * p.qty;
    metres.set(p.profileId, m);
  }
  const cutLines = [...cuts.values()].sort((a, b) => a.profileName.localeCompare(b.profileName) || b.length_mm - a.length_mm);
  const metreLines = [...metres.values()]
    .sort((a, b) => a.profileName.localeCompare(b.profileName))
    .map((m) => {
      const price = pricing.pricePerMetre[m.profileId] ?? null;
      const metresRounded = Math.round(m.mm) / 1000;
      return { profileId: m.profileId, profileName: m.profileName, metres: metresRounded, pricePerMetre: price, cost: price === null ? null : money(price * metresRounded) };
    });
  const material = metreLines.every((m) => m.cost !== null) ? metreLines.reduce((s, m) => s + (m.cost ?? 0), 0) : null;
  const fee = pricing.feePerCut;
  return {
    currency,
    stock: stockLines,
    stockTotal: money(stockLines.reduce((s, l) => s + l.cost, 0)),
    cutToLength: cutLines,
    cutToLengthMetres: metreLines,
    cutCount,
    feePerCut: fee,
    cutToLengthTotal: material === null || fee === null ? null : money(material + fee * cutCount),
  };
}

/** The order as plain text, for the body of the e-mail to the supplier. */
export function orderText(order: OrderList, opts: { lengthText: (mm: number) => string; money: (v: number) => string; heading: string }): string {
  const lines: string[] = [opts.heading, ''];
  lines.push('Stock bars');
  if (order.stock.length === 0) lines.push('  (none)');
  for (const l of order.stock) {
    lines.push(`  ${l.qty} × ${l.profileName}, ${opts.lengthText(l.length_mm)} bars at ${opts.money(l.unitPrice)} = ${opts.money(l.cost)}`);
  }
  lines.push(`  Total: ${opts.money(order.stockTotal)}`, '');
  lines.push('Or cut to length (alternative)');
  for (const l of order.cutToLength) lines.push(`  ${l.qty} × ${l.profileName} cut to ${opts.lengthText(l.length_mm)} (marks ${l.marks.join(', ')})`);
  lines.push(`  ${order.cutCount} cuts${order.feePerCut === null ? '' : ` at ${opts.money(order.feePerCut)} per cut`}`);
  if (order.cutToLengthTotal !== null) lines.push(`  Total: ${opts.money(order.cutToLengthTotal)}`);
  return lines.join('\n');
}
