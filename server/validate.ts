import type { z } from 'zod';
import { findUnstorable } from '@shared/limits';
import { ValidationError } from './errors';

/** zod issues → `{ 'path.to.field': message }` (first message per path wins). */
export function issueFields(issues: readonly z.core.$ZodIssue[], root = 'body'): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of issues) {
    const key = issue.path.length > 0 ? issue.path.map(String).join('.') : root;
    fields[key] ??= issue.message;
  }
  return fields;
}

/**
 * Parses untrusted input at the edge; throws a 400 naming every bad field. Before the schema, the whole value
 * is walked once for what no schema should have to think of: text the database cannot store (anywhere, keys
 * included, free-form documents too) and nesting deep enough to hurt.
 */
export function parseInput<S extends z.ZodType>(schema: S, value: unknown, root = 'body'): z.output<S> {
  const bad = findUnstorable(value);
  if (bad) throw new ValidationError({ [bad.path || root]: bad.message });
  const result = schema.safeParse(value ?? {});
  if (!result.success) throw new ValidationError(issueFields(result.error.issues, root));
  return result.data;
}
