// Reads the shared bin-packing benchmark in place (its licence forbids copies): BPP format, line 1 = n, line 2 =
// capacity, then one item size per line.
import { readFileSync, existsSync } from 'node:fs';
import { join } from 'node:path';

export interface BenchInstance {
  name: string;
  set: string;
  path: string;
  capacity: number;
  items: number[];
  optimum: number;
}

/** `../shared/bench/bpp` beside the repository, or BPP_DIR where the checkout sits elsewhere. */
export const benchDir = process.env.BPP_DIR ?? new URL('../../../shared/bench/bpp/', import.meta.url).pathname;

export function benchAvailable(dir = benchDir): boolean {
  return existsSync(join(dir, 'optima.tsv'));
}

export function parseBpp(text: string): { capacity: number; items: number[] } {
  const nums = text.split(/\s+/).filter(Boolean).map(Number);
  const [n, capacity] = nums;
  const items = nums.slice(2, 2 + n);
  if (items.length !== n || items.some((x) => !Number.isFinite(x))) throw new Error('malformed instance');
  return { capacity, items };
}

export function loadInstances(opts: { quick?: boolean; sets?: string[]; dir?: string } = {}): BenchInstance[] {
  const dir = opts.dir ?? benchDir;
  const rows = readFileSync(join(dir, 'optima.tsv'), 'utf8').trim().split(/\r?\n/).slice(1);
  let wanted: Set<string> | null = null;
  if (opts.quick) {
    wanted = new Set(readFileSync(join(dir, 'quick.txt'), 'utf8').split(/\r?\n/).map((s) => s.trim()).filter(Boolean));
  }
  const out: BenchInstance[] = [];
  for (const row of rows) {
    const [name, set, path, , , , opt] = row.split('\t');
    if (wanted && !wanted.has(path)) continue;
    if (opts.sets && !opts.sets.some((s) => s.toLowerCase() === set.toLowerCase() || name.toLowerCase().includes(s.toLowerCase()))) continue;
    const { capacity, items } = parseBpp(readFileSync(join(dir, path), 'utf8'));
    out.push({ name, set, path, capacity, items, optimum: Number(opt) });
  }
  return out;
}
