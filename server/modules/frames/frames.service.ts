import { recordActivity } from '../activity/activity.service';
import { LockMode, type EntityManager } from '@mikro-orm/postgresql';
import {
  REVISION_PAUSE_MINUTES,
  type Frame as FrameDto,
  type FrameDocumentJson,
  type FrameSummary,
  type Revision,
  type RevisionComparison,
  type RevisionSummary,
  type SaveFrameDocumentResponse,
} from '@shared/api/frames';
import type { UserRef } from '@shared/api/common';
import type { Role } from '@shared/api/roles';
import type { RevisionDiff } from '@shared/engine/revision-diff';
import { NotFoundError, UnprocessableError, VersionConflictError } from '../../errors';
import type { WorkerPool } from '../../workers/pool';
import { binCutoff } from '../access/access.service';
import { Project, type ProjectEntity } from '../projects/project.entity';
import { User, type UserEntity } from '../users/user.entity';
import { CURRENT_SCHEMA_VERSION } from '@shared/model/frame-document';
import { withWorkshopDefaults } from '@shared/api/workshop-settings';
import { workshopSettings } from '../workshops/workshop-settings.service';
import { checkFrameDocument } from './frame-document';
import { FrameRevision } from './frame-revision.entity';
import { Frame, type FrameEntity } from './frame.entity';

function userRef(u: UserEntity | null | undefined): UserRef | null {
  return u ? { id: u.id, name: u.name } : null;
}

export function toFrameSummary(
  f: Pick<FrameEntity, 'id' | 'project' | 'name' | 'version' | 'memberCount' | 'updatedAt' | 'deletedAt'>,
): FrameSummary {
  return {
    id: f.id,
    projectId: f.project.id,
    name: f.name,
    version: f.version,
    memberCount: f.memberCount,
    updatedAt: f.updatedAt.toISOString(),
    deletedAt: f.deletedAt ? f.deletedAt.toISOString() : null,
  };
}

async function toFrameDto(em: EntityManager, f: FrameEntity, role: Role): Promise<FrameDto> {
  await em.populate(f, ['project', 'savedBy']);
  return {
    ...toFrameSummary(f),
    workshopId: f.project.workshop.id,
    document: f.document,
    role,
    updatedBy: userRef(f.savedBy),
  };
}

function touchProject(em: EntityManager, projectId: string, at: Date): Promise<number> {
  return em.nativeUpdate(Project, { id: projectId }, { updatedAt: at });
}

/** Live frames, or (deleted = true) only the ones in the bin, most recently deleted first. */
export async function listFrameSummaries(em: EntityManager, projectId: string, deleted: boolean): Promise<FrameSummary[]> {
  const frames = await em.find(
    Frame,
    { project: projectId, deletedAt: deleted ? { $gt: binCutoff() } : null },
    { exclude: ['document'], orderBy: deleted ? { deletedAt: 'desc' } : { name: 'asc', createdAt: 'asc' } },
  );
  return frames.map(toFrameSummary);
}

export async function createFrame(
  em: EntityManager,
  project: ProjectEntity,
  role: Role,
  userId: string,
  input: { name: string; document?: unknown },
): Promise<FrameDto> {
  // A new frame reads and cuts as its workshop does, unless the document it came with says otherwise.
  const ws = await workshopSettings(em, project.workshop.id);
  const { document, memberCount } = checkFrameDocument(withWorkshopDefaults(input.document ?? { schemaVersion: CURRENT_SCHEMA_VERSION }, ws));
  const now = new Date();
  const frame = em.create(Frame, {
    project,
    name: input.name,
    document,
    version: 1,
    memberCount,
    savedAt: now,
    savedBy: em.getReference(User, userId),
    // A frame made from a given document (a copy, an import) starts from something worth going back to.
    headKept: input.document !== undefined,
  });
  await em.flush();
  await touchProject(em, project.id, now);
  return toFrameDto(em, frame, role);
}

export async function getFrame(em: EntityManager, frame: FrameEntity, role: Role): Promise<FrameDto> {
  return toFrameDto(em, frame, role);
}

function refuseIfDeleted(frame: FrameEntity): void {
  if (frame.deletedAt) throw new UnprocessableError('The frame is deleted; restore it first');
}

/** Renaming leaves `version` alone: the version counts document saves. */
export async function renameFrame(em: EntityManager, frame: FrameEntity, name: string): Promise<FrameSummary> {
  refuseIfDeleted(frame);
  frame.name = name;
  await em.flush();
  await touchProject(em, frame.project.id, frame.updatedAt);
  return toFrameSummary(frame);
}

/** Whether the document now stored ends an editing stretch, i.e. is kept as a revision when the next save replaces it. */
function headEndsStretch(frame: FrameEntity, userId: string, now: Date): boolean {
  if (frame.headKept || frame.headName != null) return true;
  if (frame.savedBy?.id !== userId) return true;
  return now.getTime() - frame.savedAt.getTime() >= REVISION_PAUSE_MINUTES * 60_000;
}

/** The frame row locked for a change, after checking the caller started from the version stored (409 if not). */
async function lockAtVersion(tem: EntityManager, frameId: string, baseVersion: number): Promise<FrameEntity> {
  const frame = await tem.findOneOrFail(Frame, { id: frameId }, { lockMode: LockMode.PESSIMISTIC_WRITE, refresh: true });
  refuseIfDeleted(frame);
  await tem.populate(frame, ['savedBy']);
  if (frame.version !== baseVersion) {
    throw new VersionConflictError({
      version: frame.version,
      document: frame.document,
      savedAt: frame.savedAt.toISOString(),
      savedBy: userRef(frame.savedBy),
    });
  }
  return frame;
}

/**
 * Stores a new document as version + 1. The one it replaces is kept as a revision when it ended an editing
 * stretch (or `keepReplaced`); otherwise it was a step of the stretch this save continues, and is folded in.
 */
function replaceDocument(
  tem: EntityManager,
  frame: FrameEntity,
  userId: string,
  checked: { document: FrameDocumentJson; memberCount: number },
  opts: { keepReplaced?: boolean; headKept?: boolean; headName?: string | null } = {},
): Date {
  const now = new Date();
  if (opts.keepReplaced || headEndsStretch(frame, userId, now)) {
    tem.create(FrameRevision, {
      frame,
      version: frame.version,
      document: frame.document,
      memberCount: frame.memberCount,
      savedAt: frame.savedAt,
      savedBy: frame.savedBy ?? null,
      name: frame.headName ?? null,
    });
  }
  frame.document = checked.document;
  frame.memberCount = checked.memberCount;
  frame.version += 1;
  frame.savedAt = now;
  frame.savedBy = tem.getReference(User, userId);
  frame.headKept = opts.headKept ?? false;
  frame.headName = opts.headName ?? null;
  return now;
}

/**
 * Optimistic locking with a row lock for the check itself: the frame row is locked, its version compared with
 * the one the client started from, and only then is the new document stored. Every save is a new version (the
 * guard against overwriting someone's work); only the end of each editing stretch stays as a revision.
 * A stale save changes nothing and reports what is stored now.
 */
export async function saveFrameDocument(
  em: EntityManager,
  frameId: string,
  userId: string,
  baseVersion: number,
  json: FrameDocumentJson,
): Promise<SaveFrameDocumentResponse> {
  const checked = checkFrameDocument(json);
  return em.transactional(async (tem) => {
    const frame = await lockAtVersion(tem, frameId, baseVersion);
    const now = replaceDocument(tem, frame, userId, checked);
    await tem.flush();
    await touchProject(tem, frame.project.id, now);
    await recordActivity(tem, { projectId: frame.project.id, userId, kind: 'frame.saved', subject: frame.name, groupKey: frame.id });
    return { version: frame.version, updatedAt: frame.updatedAt.toISOString() };
  });
}

function currentSummary(frame: FrameEntity): RevisionSummary {
  return {
    version: frame.version,
    savedAt: frame.savedAt.toISOString(),
    savedBy: userRef(frame.savedBy),
    memberCount: frame.memberCount,
    current: true,
    name: frame.headName ?? null,
  };
}

/** Newest first; the first entry is the frame's current version, the others the kept revisions. */
export async function listRevisions(em: EntityManager, frame: FrameEntity): Promise<RevisionSummary[]> {
  await em.populate(frame, ['savedBy']);
  const older = await em.find(
    FrameRevision,
    { frame: frame.id },
    { exclude: ['document'], populate: ['savedBy'], orderBy: { version: 'desc' } },
  );
  return [
    currentSummary(frame),
    ...older.map((r) => ({
      version: r.version,
      savedAt: r.savedAt.toISOString(),
      savedBy: userRef(r.savedBy),
      memberCount: r.memberCount,
      current: false,
      name: r.name ?? null,
    })),
  ];
}

export async function getRevision(em: EntityManager, frame: FrameEntity, version: number): Promise<Revision> {
  if (version === frame.version) {
    await em.populate(frame, ['savedBy']);
    return { version, name: frame.headName ?? null, document: frame.document, savedAt: frame.savedAt.toISOString(), savedBy: userRef(frame.savedBy) };
  }
  const r = await em.findOne(FrameRevision, { frame: frame.id, version }, { populate: ['savedBy'] });
  if (!r) throw new NotFoundError('Revision', { version: `No kept revision ${version} of this frame` });
  return { version: r.version, name: r.name ?? null, document: r.document, savedAt: r.savedAt.toISOString(), savedBy: userRef(r.savedBy) };
}

/** "Save revision" and leaving the editor: the current document is kept when the next save replaces it. */
export async function keepRevision(
  em: EntityManager,
  frameId: string,
  baseVersion: number,
  name: string | null | undefined,
): Promise<RevisionSummary> {
  return em.transactional(async (tem) => {
    const frame = await lockAtVersion(tem, frameId, baseVersion);
    frame.headKept = true;
    if (name !== undefined) frame.headName = name;
    await tem.flush();
    return currentSummary(frame);
  });
}

/** Names a kept revision or the current version (naming the current one keeps it); null takes the name off. */
export async function nameRevision(em: EntityManager, frame: FrameEntity, version: number, name: string | null): Promise<RevisionSummary> {
  refuseIfDeleted(frame);
  if (version === frame.version) {
    frame.headName = name;
    if (name !== null) frame.headKept = true;
    await em.flush();
    await em.populate(frame, ['savedBy']);
    return currentSummary(frame);
  }
  const r = await em.findOne(FrameRevision, { frame: frame.id, version }, { exclude: ['document'], populate: ['savedBy'] });
  if (!r) throw new NotFoundError('Revision', { version: `No kept revision ${version} of this frame` });
  r.name = name;
  await em.flush();
  return { version: r.version, savedAt: r.savedAt.toISOString(), savedBy: userRef(r.savedBy), memberCount: r.memberCount, current: false, name: r.name ?? null };
}

/**
 * Both revisions' reports side by side: which members were added, removed, moved, and the cut list and hardware,
 * worked out in a worker thread (../../workers/report.task); `signal` ends it when the client leaves.
 */
export async function compareRevisions(
  em: EntityManager,
  workers: WorkerPool,
  frame: FrameEntity,
  from: number,
  to: number,
  signal?: AbortSignal,
): Promise<RevisionComparison> {
  const [a, b] = [await getRevision(em, frame, from), await getRevision(em, frame, to)];
  const { document: before, ...fromMeta } = a;
  const { document: after, ...toMeta } = b;
  const diff = await workers.run<RevisionDiff>({ task: 'compareRevisions', before, after }, signal);
  return { from: fromMeta, to: toMeta, diff };
}

/**
 * An earlier revision's document saved again as a new version: the history only grows. The document it replaces
 * is kept whatever the stretch, and the restored one is kept too, named for where it came from.
 */
export async function restoreRevision(
  em: EntityManager,
  frame: FrameEntity,
  userId: string,
  version: number,
  baseVersion: number,
): Promise<SaveFrameDocumentResponse> {
  refuseIfDeleted(frame);
  if (version === frame.version) throw new UnprocessableError('That revision is the current one', { version: 'Already the current version' });
  const kept = await getRevision(em, frame, version);
  const checked = checkFrameDocument(kept.document);
  return em.transactional(async (tem) => {
    const locked = await lockAtVersion(tem, frame.id, baseVersion);
    const label = kept.name ? `Restored from ${version} (${kept.name})` : `Restored from ${version}`;
    const now = replaceDocument(tem, locked, userId, checked, { keepReplaced: true, headKept: true, headName: label.slice(0, 80) });
    await tem.flush();
    await touchProject(tem, locked.project.id, now);
    await recordActivity(tem, { projectId: locked.project.id, userId, kind: 'frame.saved', subject: locked.name, groupKey: locked.id });
    return { version: locked.version, updatedAt: locked.updatedAt.toISOString() };
  });
}

/** To the bin: listed there (and with ?deleted=true) and restorable for BIN_DAYS, then purged. */
export async function deleteFrame(em: EntityManager, frame: FrameEntity, userId: string): Promise<void> {
  frame.deletedAt = new Date();
  frame.deletedBy = em.getReference(User, userId);
  await em.flush();
}

export async function restoreFrame(em: EntityManager, frame: FrameEntity): Promise<FrameSummary> {
  frame.deletedAt = null;
  frame.deletedBy = null;
  await em.flush();
  return toFrameSummary(frame);
}
