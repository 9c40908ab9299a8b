// Strict cut jobs: a key the schema does not know, or a stock line without a price beside priced ones, is refused
// with an error naming it, and counts are bounded, instead of a plan made from a silently different job.
import { describe, expect, it } from 'vitest';
import { planCutsSync, validateCutJob } from '../../../shared/planner';
import { DEFAULT_KERF_MM, MAX_PIECES } from '../../../shared/planner/job';

const fieldOf = (f: () => unknown): string => {
  try {
    f();
  } catch (e) {
    return `${(e as { field?: string }).field} | ${(e as Error).message}`;
  }
  return 'no error';
};

describe('cut job input', () => {
  it('names an unknown key instead of planning without it', () => {
    const msg = fieldOf(() => planCutsSync({ kerf_mm: 3, trim_mm: 10, stock: [{ length: 6000 }], parts: [{ length: 1497, qty: 4 }] } as never));
    expect(msg).toMatch(/^kerf_mm \| /);
    expect(msg).toContain('"kerf_mm"');
    expect(msg).toContain('"trim_mm"');
    expect(fieldOf(() => validateCutJob({ stock: [{ length: 6000, cost: 4 }], parts: [{ length: 100, qty: 1 }] }))).toMatch(/^stock\[0\]\.cost \| /);
    expect(fieldOf(() => validateCutJob({ stock: [{ length: 6000 }], parts: [{ length: 100, qty: 1, lenght: 3 }] }))).toMatch(/^parts\[0\]\.lenght \| /);
  });

  it('with the keys spelt right, 4 × 1497 needs a second 6000 bar (10 trim + 4 × 1497 + 3 kerfs of 3 = 6007)', () => {
    const plan = planCutsSync({ kerf: 3, trim: 10, stock: [{ length: 6000 }], parts: [{ length: 1497, qty: 4 }] });
    expect(10 + 4 * 1497 + 3 * 3).toBe(6007);
    expect(plan.barCount).toBe(2);
  });

  it('refuses a stock line without a price beside priced ones', () => {
    const msg = fieldOf(() => validateCutJob({ stock: [{ length: 6000, price: 40 }, { length: 3000 }], parts: [{ length: 1000, qty: 14 }] }));
    expect(msg).toMatch(/^stock\[1\]\.price \| /);
  });

  it('states the default kerf (3 mm) and uses it', () => {
    expect(DEFAULT_KERF_MM).toBe(3);
    const job = validateCutJob({ stock: [{ length: 1000 }], parts: [{ length: 500, qty: 2 }] });
    expect(job.kerf).toBe(3);
    // 500 + 3 + 500 = 1003 > 1000: two bars with the default kerf, one without.
    expect(planCutsSync({ stock: [{ length: 1000 }], parts: [{ length: 500, qty: 2 }] }).barCount).toBe(2);
    expect(planCutsSync({ kerf: 0, stock: [{ length: 1000 }], parts: [{ length: 500, qty: 2 }] }).barCount).toBe(1);
  });

  it('bounds quantities per part and pieces in all', () => {
    expect(fieldOf(() => validateCutJob({ stock: [{ length: 6000 }], parts: [{ length: 100, qty: 1e9 }] }))).toMatch(/^parts\[0\]\.qty \| /);
    const many = Array.from({ length: 3 }, () => ({ length: 100, qty: Math.ceil(MAX_PIECES / 2) }));
    expect(fieldOf(() => validateCutJob({ stock: [{ length: 6000 }], parts: many }))).toMatch(/^parts \| .*pieces/);
    expect(fieldOf(() => validateCutJob({ stock: [{ length: 1e7 }], parts: [{ length: 100, qty: 1 }] }))).toMatch(/^stock\[0\]\.length \| /);
  });
});
