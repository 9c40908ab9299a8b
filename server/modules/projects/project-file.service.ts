import type { EntityManager } from '@mikro-orm/postgresql';
import { MAX_PROJECT_FILE_BYTES, PROJECT_FILE_FORMAT, PROJECT_FILE_VERSION } from '@shared/api/project-file';
import type { ProjectSummary } from '@shared/api/projects';
import { HttpError } from '../../errors';
import type { CheckedProjectFile } from '../../workers/project-file.task';
import { Attachment } from '../attachments/attachment.entity';
import { CutSession } from '../cutting/cut-session.entity';
import { CutTick } from '../cutting/cut-tick.entity';
import { FrameRevision } from '../frames/frame-revision.entity';
import { Frame } from '../frames/frame.entity';
import { User } from '../users/user.entity';
import { Workshop } from '../workshops/workshop.entity';
import { Project, type ProjectEntity } from './project.entity';
import { liveFrameCounts, toSummary } from './projects.service';

// A project to one file and back (the format: shared/api/project-file.ts). The export splices the documents in as
// the text PostgreSQL keeps, so a large project costs string joins rather than a parse and a stringify on the
// event loop; the import stores a file the worker has already read and checked, in one transaction.

const j = JSON.stringify;
const iso = (d: Date | string) => new Date(d).toISOString();

type FrameRow = { id: string; name: string; version: number; saved_at: Date; document: string };
type RevisionRow = { frame_id: string; version: number; saved_at: Date; document: string };
type SessionRow = { id: string; frame_id: string; frame_version: number; started_at: Date; plan: string };
type TickRow = { session_id: string; cut_key: string; mark: string; ticked_at: Date };
type AttachmentRow = { filename: string; content_type: string; shared_with_client: boolean; created_at: Date; data: Buffer };

function groupBy<T, K>(rows: T[], key: (r: T) => K): Map<K, T[]> {
  const out = new Map<K, T[]>();
  for (const r of rows) out.set(key(r), [...(out.get(key(r)) ?? []), r]);
  return out;
}

/** The project's live frames (with revisions and cutting) and files as one project file; 413 past the size bound. */
export async function exportProjectFile(em: EntityManager, project: ProjectEntity): Promise<string> {
  const conn = em.getConnection();
  const live = 'from frames f where f.project_id = ? and f.deleted_at is null';
  const frames = await conn.execute<FrameRow[]>(`select f.id, f.name, f.version, f.saved_at, f.document::text as document ${live} order by f.name, f.created_at`, [project.id]);
  const revisions = await conn.execute<RevisionRow[]>(
    `select r.frame_id, r.version, r.saved_at, r.document::text as document from frame_revisions r join frames f on f.id = r.frame_id where f.project_id = ? and f.deleted_at is null order by r.version`,
    [project.id],
  );
  const sessions = await conn.execute<SessionRow[]>(
    `select s.id, s.frame_id, s.frame_version, s.started_at, s.plan::text as plan from cut_sessions s join frames f on f.id = s.frame_id where f.project_id = ? and f.deleted_at is null order by s.started_at`,
    [project.id],
  );
  const ticks = await conn.execute<TickRow[]>(
    `select t.session_id, t.cut_key, t.mark, t.ticked_at from cut_ticks t join cut_sessions s on s.id = t.session_id join frames f on f.id = s.frame_id
      where f.project_id = ? and f.deleted_at is null order by t.ticked_at`,
    [project.id],
  );
  const attachments = await conn.execute<AttachmentRow[]>(
    'select filename, content_type, shared_with_client, created_at, data from attachments where project_id = ? order by created_at',
    [project.id],
  );
  const bytes =
    [...frames, ...revisions].reduce((n, r) => n + r.document.length, 0) +
    sessions.reduce((n, s) => n + s.plan.length, 0) +
    attachments.reduce((n, a) => n + Math.ceil(a.data.length / 3) * 4, 0);
  if (bytes > MAX_PROJECT_FILE_BYTES) {
    throw new HttpError('payload_too_large', `The project is larger than ${MAX_PROJECT_FILE_BYTES / 1024 / 1024} MB as one file; remove some of its files or frames first`);
  }

  const revisionsOf = groupBy(revisions, (r) => r.frame_id);
  const sessionsOf = groupBy(sessions, (s) => s.frame_id);
  const ticksOf = groupBy(ticks, (t) => t.session_id);
  const tickText = (t: TickRow) => j({ cutKey: t.cut_key, mark: t.mark, tickedAt: iso(t.ticked_at) });
  const sessionText = (s: SessionRow) =>
    `{"frameVersion":${s.frame_version},"startedAt":${j(iso(s.started_at))},"plan":${s.plan},"ticks":[${(ticksOf.get(s.id) ?? []).map(tickText).join(',')}]}`;
  const revisionText = (r: RevisionRow) => `{"version":${r.version},"savedAt":${j(iso(r.saved_at))},"document":${r.document}}`;
  const frameText = (f: FrameRow) =>
    `{"name":${j(f.name)},"version":${f.version},"savedAt":${j(iso(f.saved_at))},"document":${f.document},` +
    `"revisions":[${(revisionsOf.get(f.id) ?? []).map(revisionText).join(',')}],"cutting":[${(sessionsOf.get(f.id) ?? []).map(sessionText).join(',')}]}`;
  const attachmentText = (a: AttachmentRow) =>
    `${j({ filename: a.filename, contentType: a.content_type, sharedWithClient: a.shared_with_client, createdAt: iso(a.created_at) }).slice(0, -1)},"data":"${a.data.toString('base64')}"}`;
  const head = j({ format: PROJECT_FILE_FORMAT, version: PROJECT_FILE_VERSION, exportedAt: new Date().toISOString(), project: { name: project.name, client: project.client, notes: project.notes } });
  return `${head.slice(0, -1)},"frames":[${frames.map(frameText).join(',')}],"attachments":[${attachments.map(attachmentText).join(',')}]}`;
}

/** Stores a checked project file as a new project of `workshopId`: new ids throughout, nothing from elsewhere. */
export async function importProjectFile(em: EntityManager, workshopId: string, userId: string, file: CheckedProjectFile): Promise<ProjectSummary> {
  const project = await em.transactional(async (tem) => {
    const importer = tem.getReference(User, userId);
    const p = tem.create(Project, { workshop: tem.getReference(Workshop, workshopId), ...file.project });
    for (const f of file.frames) {
      // The imported state is kept as a revision when the importer's first save replaces it.
      const frame = tem.create(Frame, { project: p, name: f.name, document: f.document, version: f.version, memberCount: f.memberCount, savedAt: new Date(f.savedAt), savedBy: importer, headKept: true });
      for (const r of f.revisions) {
        tem.create(FrameRevision, { frame, version: r.version, document: r.document, memberCount: r.memberCount, savedAt: new Date(r.savedAt), savedBy: null });
      }
      for (const c of f.cutting) {
        const session = tem.create(CutSession, { frame, frameVersion: c.frameVersion, plan: c.plan, startedAt: new Date(c.startedAt), startedBy: null });
        for (const t of c.ticks) tem.create(CutTick, { session, cutKey: t.cutKey, mark: t.mark, tickedAt: new Date(t.tickedAt), tickedBy: null });
      }
    }
    for (const a of file.attachments) {
      const data = Buffer.from(a.data.buffer, a.data.byteOffset, a.data.byteLength);
      tem.create(Attachment, { project: p, filename: a.filename, contentType: a.contentType, size: data.length, data, sharedWithClient: a.sharedWithClient, uploadedBy: importer, createdAt: new Date(a.createdAt) });
    }
    await tem.flush();
    return p;
  });
  const counts = await liveFrameCounts(em, [project.id]);
  return toSummary(project, counts.get(project.id) ?? 0);
}
