import { z } from 'zod';

/**
 * Bounds on everything a caller can send, shared by the browser, the server and the engine, so that no single
 * document or request can make the engine or the database do unbounded work. Generous for furniture, camper
 * galleys and workshop frames, far below what would hurt.
 */
export const LIMITS = {
  /** Any length, offset or size in a frame, in mm (100 m). */
  length_mm: 100_000,
  /** Where a resolved member may lie, in mm from the origin on any axis (1 km: datums chained end to end). */
  extent_mm: 1_000_000,
  /** A mass in kg (a module, its contents, a tank's litres). */
  mass_kg: 10_000,
  /** Sum of all members' lengths in mm (20 km): bounds the cells the joint search walks. */
  totalLength_mm: 20_000_000,
  members: 5_000,
  modules: 1_000,
  datums: 5_000,
  runs: 100,
  baysPerRun: 100,
  profiles: 200,
  joinMethods: 100,
  joints: 10_000,
  /** Parts, size terms, member ids and similar short lists inside one record. */
  listItems: 100,
  /** JSON nesting any request body may have. */
  depth: 32,
} as const;

// A NUL, a lone high surrogate or a lone low surrogate: PostgreSQL refuses the first in text and the others in jsonb.
const UNSTORABLE = /\u0000|[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/;

export const UNSTORABLE_TEXT_MESSAGE = 'must not contain NUL characters or broken Unicode (an unpaired surrogate)';

/** True when the database can keep `s` as it is. */
export function isStorableText(s: string): boolean {
  return !UNSTORABLE.test(s);
}

/** Adds the storable-text check to a string schema (keeps its other checks and its type). */
export function storable<T extends z.ZodString>(schema: T, message = UNSTORABLE_TEXT_MESSAGE): T {
  return schema.refine(isStorableText, { message }) as T;
}

/** A length in mm within ±LIMITS.length_mm (finite: zod refuses NaN and infinities). */
export function lengthMm(label = 'mm'): z.ZodNumber {
  return z
    .number()
    .min(-LIMITS.length_mm, `must be at least -${LIMITS.length_mm} ${label}`)
    .max(LIMITS.length_mm, `must be at most ${LIMITS.length_mm} ${label}`);
}

/**
 * The first place in a parsed JSON value that could not be stored or would nest too deeply: a path such as
 * `members.3.name` (a key itself is checked too) and the reason; null when it is all fine. Iterative, so a hostile
 * nesting cannot exhaust the stack.
 */
export function findUnstorable(value: unknown, maxDepth: number = LIMITS.depth): { path: string; message: string } | null {
  const stack: { v: unknown; path: string[] }[] = [{ v: value, path: [] }];
  while (stack.length > 0) {
    const { v, path } = stack.pop() as { v: unknown; path: string[] };
    if (typeof v === 'string') {
      if (!isStorableText(v)) return { path: path.join('.'), message: UNSTORABLE_TEXT_MESSAGE };
      continue;
    }
    if (typeof v !== 'object' || v === null) continue;
    if (path.length >= maxDepth) return { path: path.join('.'), message: `must not nest deeper than ${maxDepth} levels` };
    if (Array.isArray(v)) {
      for (let i = v.length - 1; i >= 0; i--) stack.push({ v: v[i], path: [...path, String(i)] });
      continue;
    }
    for (const key of Object.keys(v)) {
      if (!isStorableText(key)) return { path: [...path, '(key)'].join('.'), message: `a key ${UNSTORABLE_TEXT_MESSAGE}` };
      stack.push({ v: (v as Record<string, unknown>)[key], path: [...path, key] });
    }
  }
  return null;
}
