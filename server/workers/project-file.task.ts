import { planCutKeys } from '@shared/api/cut-plan';
import type { FrameDocumentJson } from '@shared/api/frames';
import type { CutSessionPlan } from '@shared/api/shop';
import { MAX_ATTACHMENT_BYTES } from '@shared/api/shop';
import { projectFileHeaderSchema, projectFileSchema, type ProjectFile } from '@shared/api/project-file';
import { findUnstorable } from '@shared/limits';
import { UnprocessableError } from '../errors';
import { sniffType } from '../modules/attachments/sniff';
import { checkFrameDocument } from '../modules/frames/frame-document';
import { issueFields } from '../validate';

// Reading a project file: JSON.parse, the schema, every frame document and revision through the document model,
// every tick against its plan, every attached file sniffed. All of it CPU work on up to 50 MB, so it runs in a
// worker thread; what comes back is either the file ready to store or the fields that are wrong, named by their
// path in the file (`frames.2.revisions.0.document.members.3.length_mm`).

export interface CheckedRevision {
  version: number;
  savedAt: string;
  document: FrameDocumentJson;
  memberCount: number;
}
export interface CheckedFrame extends CheckedRevision {
  name: string;
  revisions: CheckedRevision[];
  cutting: { frameVersion: number; startedAt: string; plan: CutSessionPlan; ticks: { cutKey: string; mark: string; tickedAt: string }[] }[];
}
export interface CheckedProjectFile {
  project: { name: string; client: string; notes: string };
  frames: CheckedFrame[];
  attachments: { filename: string; contentType: string; sharedWithClient: boolean; createdAt: string; data: Uint8Array }[];
}

export type ProjectFileReading = { ok: true; file: CheckedProjectFile } | { ok: false; message: string; fields: Record<string, string> };

const refuse = (fields: Record<string, string>, message = 'The project file has invalid fields'): ProjectFileReading => ({ ok: false, message, fields });

export function readProjectFile(bytes: Uint8Array): ProjectFileReading {
  let json: unknown;
  try {
    json = JSON.parse(Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength).toString('utf8'));
  } catch {
    return refuse({ file: 'Not a project file: it is not JSON' }, 'The file could not be read');
  }
  const unstorable = findUnstorable(json);
  if (unstorable) return refuse({ [unstorable.path || 'file']: unstorable.message });
  const header = projectFileHeaderSchema.safeParse(json);
  if (!header.success) return refuse(issueFields(header.error.issues, 'file'), 'The file is not a project file this server reads');
  const parsed = projectFileSchema.safeParse(json);
  if (!parsed.success) return refuse(issueFields(parsed.error.issues, 'file'));

  const fields: Record<string, string> = {};
  const frames = parsed.data.frames.map((f, i) => checkFrame(f, `frames.${i}`, fields));
  const attachments = parsed.data.attachments.map((a, i) => {
    const data = Buffer.from(a.data, 'base64');
    if (data.length === 0) fields[`attachments.${i}.data`] = 'The file is empty';
    else if (data.length > MAX_ATTACHMENT_BYTES) fields[`attachments.${i}.data`] = `At most ${MAX_ATTACHMENT_BYTES / 1024 / 1024} MB`;
    else if (sniffType(data) !== a.contentType) fields[`attachments.${i}.data`] = `The data is not ${a.contentType}`;
    return { ...a, data: new Uint8Array(data.buffer, data.byteOffset, data.byteLength) };
  });
  if (Object.keys(fields).length > 0) return refuse(fields);
  const { name, client = '', notes = '' } = parsed.data.project;
  return { ok: true, file: { project: { name, client, notes }, frames, attachments } };
}

/** A document checked by the document model (older schema versions upgraded), its problems under `at`. */
function checkDocument(json: unknown, at: string, fields: Record<string, string>): { document: FrameDocumentJson; memberCount: number } {
  try {
    return checkFrameDocument(json);
  } catch (err) {
    if (!(err instanceof UnprocessableError)) throw err;
    for (const [k, v] of Object.entries(err.fields ?? { document: err.message })) fields[`${at}.${k}`] ??= v;
    return { document: {}, memberCount: 0 };
  }
}

function checkFrame(f: ProjectFile['frames'][number], at: string, fields: Record<string, string>): CheckedFrame {
  const seen = new Set<number>();
  const revisions = f.revisions.map((r, j) => {
    if (r.version >= f.version) fields[`${at}.revisions.${j}.version`] = `Must be earlier than the frame's version ${f.version}`;
    else if (seen.has(r.version)) fields[`${at}.revisions.${j}.version`] = `Version ${r.version} is listed twice`;
    seen.add(r.version);
    return { version: r.version, savedAt: r.savedAt, ...checkDocument(r.document, `${at}.revisions.${j}`, fields) };
  });
  const cutting = f.cutting.map((c, k) => {
    if (c.frameVersion > f.version) fields[`${at}.cutting.${k}.frameVersion`] = `Must be at most the frame's version ${f.version}`;
    const keys = planCutKeys(c.plan);
    const ticked = new Set<string>();
    c.ticks.forEach((t, n) => {
      if (keys.get(t.cutKey) !== t.mark) fields[`${at}.cutting.${k}.ticks.${n}.cutKey`] = 'No such cut (with this mark) in the plan';
      else if (ticked.has(t.cutKey)) fields[`${at}.cutting.${k}.ticks.${n}.cutKey`] = 'This cut is ticked twice';
      ticked.add(t.cutKey);
    });
    return c;
  });
  return { name: f.name, version: f.version, savedAt: f.savedAt, ...checkDocument(f.document, at, fields), revisions, cutting };
}
