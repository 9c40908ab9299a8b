// The classic two-dimensional bin-packing classes, generated from their published rules (sizes uniform integers):
//  - J. O. Berkey and P. Y. Wang, "Two-dimensional finite bin-packing algorithms", J. Oper. Res. Soc. 38 (1987):
//    I [1,10] in 10×10; II [1,10] in 30×30; III [1,35] in 40×40; IV [1,35] in 100×100; V [1,100] in 100×100;
//    VI [1,100] in 300×300 (width and height drawn independently).
//  - S. Martello and D. Vigo, "Exact solution of the two-dimensional finite bin packing problem", Management Science
//    44 (1998), bin 100×100 and four item types: 1: w ∈ [2W/3, W], h ∈ [1, H/2]; 2: w ∈ [1, W/2], h ∈ [2H/3, H];
//    3: w ∈ [W/2, W], h ∈ [H/2, H]; 4: w ∈ [1, W/2], h ∈ [1, H/2]. Class VII is 70 % type 1 and 10 % each of the
//    others, VIII 70 % type 2, IX 70 % type 3, X 70 % type 4.
// The papers used their own generators' streams; ours draws from a seeded mulberry32, seeds printed.

export type Instance = { name: string; cls: string; n: number; seed: number; bin: { L: number; W: number }; items: { l: number; w: number }[] };

export function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

const BW: Record<string, { lo: number; hi: number; bin: number }> = {
  I: { lo: 1, hi: 10, bin: 10 },
  II: { lo: 1, hi: 10, bin: 30 },
  III: { lo: 1, hi: 35, bin: 40 },
  IV: { lo: 1, hi: 35, bin: 100 },
  V: { lo: 1, hi: 100, bin: 100 },
  VI: { lo: 1, hi: 100, bin: 300 },
};
const MV_MAIN: Record<string, number> = { VII: 1, VIII: 2, IX: 3, X: 4 };

export const CLASSES = ['I', 'II', 'III', 'IV', 'V', 'VI', 'VII', 'VIII', 'IX', 'X'] as const;

export function generate(cls: string, n: number, seed: number): Instance {
  // One stream per (class, n, seed) so adding a class never changes another's items.
  const rand = mulberry32(seed * 1_000_003 + n * 101 + CLASSES.indexOf(cls as (typeof CLASSES)[number]) * 7919);
  const int = (lo: number, hi: number): number => lo + Math.floor(rand() * (hi - lo + 1));
  const items: { l: number; w: number }[] = [];
  let bin = 100;
  if (BW[cls]) {
    const c = BW[cls];
    bin = c.bin;
    for (let i = 0; i < n; i++) items.push({ l: int(c.lo, c.hi), w: int(c.lo, c.hi) });
  } else {
    const main = MV_MAIN[cls];
    const W = 100;
    const H = 100;
    for (let i = 0; i < n; i++) {
      const u = rand();
      const others = [1, 2, 3, 4].filter((t) => t !== main);
      const type = u < 0.7 ? main : others[Math.min(2, Math.floor((u - 0.7) / 0.1))];
      if (type === 1) items.push({ l: int(Math.ceil((2 * W) / 3), W), w: int(1, H / 2) });
      else if (type === 2) items.push({ l: int(1, W / 2), w: int(Math.ceil((2 * H) / 3), H) });
      else if (type === 3) items.push({ l: int(W / 2, W), w: int(H / 2, H) });
      else items.push({ l: int(1, W / 2), w: int(1, H / 2) });
    }
  }
  return { name: `${cls}-n${n}-s${seed}`, cls, n, seed, bin: { L: bin, W: bin }, items };
}
