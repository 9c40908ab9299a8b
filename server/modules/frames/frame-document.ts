import type { FrameDocumentJson } from '@shared/api/frames';
import { emptyFrameDocument as emptyModelDocument } from '@shared/model/frame-document';
import { frameDocumentIssues, parseFrameDocument } from '@shared/model/parse';
import { UnprocessableError } from '../../errors';

// The one place the server decides whether a frame document is acceptable: the document model's own schema
// and reference checks (older schema versions are upgraded). What is stored is the parsed document, so every
// stored document is current and complete.

export interface CheckedDocument {
  document: FrameDocumentJson;
  memberCount: number;
}

function requestField(field: string): string {
  return field === '' || field === 'document' ? 'document' : `document.${field}`;
}

/** Validates a document from a request; 422 with every problem in `fields`, keyed `document.<path>`. */
export function checkFrameDocument(json: unknown): CheckedDocument {
  const issues = frameDocumentIssues(json);
  if (issues.length > 0) {
    const fields: Record<string, string> = {};
    for (const i of issues) fields[requestField(i.field)] ??= i.message;
    throw new UnprocessableError('The frame document is not valid', fields);
  }
  const document = parseFrameDocument(json);
  return { document: document as unknown as FrameDocumentJson, memberCount: document.members.length };
}

/** The document a new frame starts with when the client sends none. */
export function emptyFrameDocument(name = ''): FrameDocumentJson {
  return emptyModelDocument(name) as unknown as FrameDocumentJson;
}
