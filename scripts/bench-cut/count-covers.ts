// How many ways a list cut from whole bars can be cut back into whole bars, by complete enumeration: plain Algorithm X
// (Knuth, "Dancing links", 2000) over the subsets of up to three parts that fill a bar exactly, branching on the length
// with the fewest usable subsets, counting every exact cover up to a node budget. On the three-part lists this says
// whether the planner faces a puzzle with one answer (the bars they were cut from) or many, and how fast a search
// that has to find that one answer grows with the list.
import { exactFillSets } from '../../shared/planner/core/exact-cover';

export interface CoverCount {
  subsets: number;
  covers: number;
  nodes: number;
  /** False when the node budget ran out first: `covers` is then only a floor. */
  complete: boolean;
}

export function countCovers(sizes: number[], demand: number[], cap: number, nodeBudget: number): CoverCount {
  const n = sizes.length;
  const sets = exactFillSets(sizes, demand, cap, 3) ?? [];
  const need = sets.map((s) => [...s.reduce((m, i) => m.set(i, (m.get(i) ?? 0) + 1), new Map<number, number>())]);
  const setsOf: number[][] = Array.from({ length: n }, () => []);
  need.forEach((nd, id) => nd.forEach(([i]) => setsOf[i].push(id)));
  const rem = demand.slice();
  const banned = new Int32Array(sets.length);
  const usable = (id: number): boolean => banned[id] === 0 && need[id].every(([i, c]) => rem[i] >= c);
  let covers = 0;
  let nodes = 0;
  const walk = (): void => {
    if (++nodes > nodeBudget) return;
    let best = -1;
    let fewest = Infinity;
    for (let i = 0; i < n; i++) {
      if (rem[i] === 0) continue;
      let c = 0;
      for (const id of setsOf[i]) if (usable(id)) c++;
      if (c < fewest) [best, fewest] = [i, c];
    }
    if (best < 0) {
      covers++;
      return;
    }
    // Each subset tried for `best` is barred from the branches after it, so no cover is counted twice.
    const tried: number[] = [];
    for (const id of setsOf[best].filter(usable)) {
      for (const [i, c] of need[id]) rem[i] -= c;
      walk();
      for (const [i, c] of need[id]) rem[i] += c;
      banned[id]++;
      tried.push(id);
      if (nodes > nodeBudget) break;
    }
    for (const id of tried) banned[id]--;
  };
  walk();
  return { subsets: sets.length, covers, nodes: Math.min(nodes, nodeBudget), complete: nodes <= nodeBudget };
}
