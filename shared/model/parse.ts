import { InputError } from '../errors';
import { frameDocumentSchema, type FrameDocument } from './frame-document';
import { checkReferences, fieldPath } from './references';
import { upgradeDocument } from './upgrades/index';

/**
 * Read a stored or received frame document: upgrade it to the current version, validate it and check its
 * references. Throws InputError whose `field` is the path of the first problem (e.g. `members[3].start.datum`).
 */
export function parseFrameDocument(json: unknown): FrameDocument {
  const upgraded = upgradeDocument(json);
  const result = frameDocumentSchema.safeParse(upgraded);
  if (!result.success) {
    const issue = result.error.issues[0];
    const field = fieldPath(issue.path);
    throw new InputError(field, `${field}: ${issue.message}`);
  }
  checkReferences(result.data);
  return result.data;
}

/** All problems zod finds, each with its field path; for forms that mark several fields at once. */
export function frameDocumentIssues(json: unknown): { field: string; message: string }[] {
  let upgraded: Record<string, unknown>;
  try {
    upgraded = upgradeDocument(json);
  } catch (e) {
    if (e instanceof InputError) return [{ field: e.field, message: e.message }];
    throw e;
  }
  const result = frameDocumentSchema.safeParse(upgraded);
  if (!result.success) return result.error.issues.map((i) => ({ field: fieldPath(i.path), message: i.message }));
  try {
    checkReferences(result.data);
  } catch (e) {
    if (e instanceof InputError) return [{ field: e.field, message: e.message }];
    throw e;
  }
  return [];
}
