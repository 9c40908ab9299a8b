import { describe, expect, it } from 'vitest';
import { findUnstorable, isStorableText, lengthMm, LIMITS } from '@shared/limits';
import { frameDocumentSchema } from '@shared/model/frame-document';

// Text PostgreSQL can keep: no U+0000 in text (PostgreSQL docs, "Character Types": the character with code zero
// cannot be stored) and well-formed UTF-16 (ECMAScript String.prototype.isWellFormed, the reference below).

describe('isStorableText', () => {
  it('agrees with String.prototype.isWellFormed (ECMAScript 2024) on surrogates, and refuses NUL', () => {
    const samples = ['plain', 'Galley 🚐', 'a\uD800', '\uDC00b', '\uD83D\uDE90', '\uDE90\uD83D', 'x\u0000y', '', 'ÿ€'];
    for (const s of samples) {
      const wellFormed = (s as string & { isWellFormed(): boolean }).isWellFormed();
      expect(isStorableText(s), JSON.stringify(s)).toBe(wellFormed && !s.includes('\u0000'));
    }
  });
});

describe('findUnstorable', () => {
  it('names the path of the first bad string, keys included', () => {
    expect(findUnstorable({ a: [{ b: 'ok' }, { c: 'x\u0000' }] })?.path).toBe('a.1.c');
    expect(findUnstorable({ ['k\uD800']: 1 })?.path).toBe('(key)');
    expect(findUnstorable({ a: 1, b: ['fine', 2, null, true] })).toBeNull();
  });

  it('refuses nesting past the bound without recursion (100,000 levels)', () => {
    let v: unknown = 1;
    for (let i = 0; i < 100_000; i++) v = [v];
    expect(findUnstorable(v)?.message).toMatch(/deeper than/);
    let ok: unknown = 1;
    for (let i = 0; i < LIMITS.depth - 1; i++) ok = { a: ok };
    expect(findUnstorable(ok)).toBeNull();
  });
});

describe('lengths and counts in the frame document', () => {
  it('lengthMm takes ±100 m and refuses beyond, NaN and infinity', () => {
    const s = lengthMm();
    expect(s.safeParse(100_000).success).toBe(true);
    expect(s.safeParse(-100_000).success).toBe(true);
    for (const bad of [100_000.001, 1e12, -1e12, Number.NaN, Number.POSITIVE_INFINITY]) expect(s.safeParse(bad).success).toBe(false);
  });

  it('a document with a member offset of 1e12 mm names the field', () => {
    const r = frameDocumentSchema.safeParse({
      schemaVersion: 1,
      members: [{ type: 'member', id: 'a', profile: '40x40-s8', axis: 'x', start: { offset_mm: 0 }, end: { offset_mm: 1e12 } }],
    });
    expect(r.success).toBe(false);
    expect(r.error?.issues.map((i) => i.path.join('.'))).toContain('members.0.end.offset_mm');
  });

  it('a NUL in a module name is refused', () => {
    const r = frameDocumentSchema.safeParse({
      schemaVersion: 1,
      modules: [{ type: 'module', id: 'm', name: 'co\u0000oler', kind: 'appliance', size: { w_mm: 1, d_mm: 1, h_mm: 1 }, mass_kg: 1, bearing: 'base' }],
    });
    expect(r.error?.issues.map((i) => i.path.join('.'))).toEqual(['modules.0.name']);
  });
});
