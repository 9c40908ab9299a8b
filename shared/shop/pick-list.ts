import type { ShopCutList, ShopHardware, ShopNutWarning } from './types';

export type PickGroup = { title: string; items: ShopHardware[] };
export type PickSheet = { groups: PickGroup[]; nutWarnings: ShopNutWarning[]; total: number };

const GROUPS: { title: string; test: (h: ShopHardware) => boolean }[] = [
  { title: 'Brackets and plates', test: (h) => h.kind === 'bracket' || h.kind === 'plate' },
  { title: 'Connectors', test: (h) => h.kind === 'connector' },
  { title: 'Screws', test: (h) => h.kind === 'screw' || h.kind === 'bolt' },
  { title: 'T-nuts and nuts', test: (h) => h.kind === 't-nut' || h.kind === 'nut' },
  { title: 'End caps', test: (h) => h.kind === 'end-cap' },
];

/** The hardware pick list: grouped the way the parts bins are, largest count first, with the slide-in warnings. */
export function pickSheet(cutList: ShopCutList): PickSheet {
  const left = [...cutList.hardware];
  const groups: PickGroup[] = [];
  for (const g of GROUPS) {
    const items = left.filter(g.test);
    if (items.length) groups.push({ title: g.title, items: items.sort((a, b) => a.name.localeCompare(b.name)) });
  }
  const other = left.filter((h) => !GROUPS.some((g) => g.test(h)));
  if (other.length) groups.push({ title: 'Other', items: other.sort((a, b) => a.name.localeCompare(b.name)) });
  return { groups, nutWarnings: cutList.nutWarnings, total: cutList.hardware.reduce((n, h) => n + h.toBuy, 0) };
}
