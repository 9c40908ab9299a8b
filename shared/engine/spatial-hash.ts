import type { Box } from './box';

/** Cell coordinates hashed to a small integer (a Map keyed by small integers is fast); a shared bucket only costs a check. */
const cellKey = (x: number, y: number, z: number): number => (Math.imul(x, 73_856_093) ^ Math.imul(y, 19_349_663) ^ Math.imul(z, 83_492_791)) & 0x3fffffff;

/**
 * A uniform grid over boxes, so finding what touches a member's end looks at the few members near it rather than
 * every member (n ends × k neighbours instead of n²).
 */
export class SpatialHash {
  private readonly cells = new Map<number, number[]>();
  private readonly stamp: Uint32Array;
  private round = 0;

  constructor(
    private readonly cell: number,
    count: number,
  ) {
    this.stamp = new Uint32Array(count);
  }

  private range(lo: number, hi: number): [number, number] {
    return [Math.floor(lo / this.cell), Math.floor(hi / this.cell)];
  }

  private each(box: Box, fn: (key: number) => void): void {
    const [x0, x1] = this.range(box.min[0], box.max[0]);
    const [y0, y1] = this.range(box.min[1], box.max[1]);
    const [z0, z1] = this.range(box.min[2], box.max[2]);
    for (let x = x0; x <= x1; x++) for (let y = y0; y <= y1; y++) for (let z = z0; z <= z1; z++) fn(cellKey(x, y, z));
  }

  insert(id: number, box: Box): void {
    this.each(box, (key) => {
      const list = this.cells.get(key);
      if (!list) this.cells.set(key, [id]);
      else if (list[list.length - 1] !== id) list.push(id);
    });
  }

  /**
   * Ids of boxes sharing a cell with `box`, each once, written into `out` (reused between calls to spare the
   * garbage collector); returns how many. The order is not meaningful.
   */
  query(box: Box, out: number[]): number {
    this.round += 1;
    let count = 0;
    const [x0, x1] = this.range(box.min[0], box.max[0]);
    const [y0, y1] = this.range(box.min[1], box.max[1]);
    const [z0, z1] = this.range(box.min[2], box.max[2]);
    for (let x = x0; x <= x1; x++) {
      for (let y = y0; y <= y1; y++) {
        for (let z = z0; z <= z1; z++) {
          const list = this.cells.get(cellKey(x, y, z));
          if (!list) continue;
          for (let k = 0; k < list.length; k++) {
            const id = list[k];
            if (this.stamp[id] === this.round) continue;
            this.stamp[id] = this.round;
            out[count++] = id;
          }
        }
      }
    }
    return count;
  }
}
