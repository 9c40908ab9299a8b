import { z } from 'zod';
import type { FrameDocumentJson } from '@shared/api/frames';
import { UnprocessableError } from '../../errors';
import { issueFields } from '../../validate';

// The one place the server decides whether a frame document is acceptable. Until the full document schema
// is available from shared/model, a document is accepted when it is an object with a numeric schemaVersion
// and a members array (anything else passes through untouched).
const minimalDocumentSchema = z.looseObject({
  schemaVersion: z.number({ message: 'Must be a number' }).int({ message: 'Must be a whole number' }).min(1),
  members: z.array(z.unknown(), { message: 'Must be an array' }),
});

export interface CheckedDocument {
  document: FrameDocumentJson;
  memberCount: number;
}

/** Validates a document from a request; 422 with `fields` keyed `document.<path>` when it is not acceptable. */
export function checkFrameDocument(json: unknown): CheckedDocument {
  const result = minimalDocumentSchema.safeParse(json);
  if (!result.success) {
    const fields = issueFields(result.error.issues, '');
    const prefixed = Object.fromEntries(Object.entries(fields).map(([k, v]) => [k ? `document.${k}` : 'document', v]));
    throw new UnprocessableError('The frame document is not valid', prefixed);
  }
  return { document: result.data, memberCount: result.data.members.length };
}

/** The document a new frame starts with when the client sends none. */
export function emptyFrameDocument(): FrameDocumentJson {
  return { schemaVersion: 1, members: [] };
}
