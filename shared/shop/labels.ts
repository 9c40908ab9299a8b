import { lengthText, opShort } from './format';
import type { ShopCutList, ShopMeta } from './types';

export type PartLabel = { mark: string; lengthText: string; profileName: string; project: string; frame: string; piece: number; of: number; ops: string };

/** One label per piece to stick on it after the cut: the mark big, then length, profile, project and machining. */
export function partLabels(cutList: ShopCutList, meta: ShopMeta): PartLabel[] {
  const labels: PartLabel[] = [];
  for (const p of cutList.parts) {
    const ops = p.ops.map((op) => opShort(op, meta.units)).join(', ');
    for (let i = 1; i <= p.qty; i++) {
      labels.push({ mark: p.mark, lengthText: lengthText(p.cutLength_mm, meta.units), profileName: p.profileName, project: meta.project, frame: meta.frame, piece: i, of: p.qty, ops });
    }
  }
  return labels;
}
