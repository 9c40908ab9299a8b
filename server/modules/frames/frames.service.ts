import { recordActivity } from '../activity/activity.service';
import { LockMode, type EntityManager } from '@mikro-orm/postgresql';
import type { Frame as FrameDto, FrameDocumentJson, FrameSummary, Revision, RevisionSummary, SaveFrameDocumentResponse } from '@shared/api/frames';
import type { UserRef } from '@shared/api/common';
import type { Role } from '@shared/api/roles';
import { NotFoundError, UnprocessableError, VersionConflictError } from '../../errors';
import { binCutoff } from '../access/access.service';
import { Project, type ProjectEntity } from '../projects/project.entity';
import { User, type UserEntity } from '../users/user.entity';
import { checkFrameDocument, emptyFrameDocument } from './frame-document';
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
  const { document, memberCount } = checkFrameDocument(input.document ?? emptyFrameDocument());
  const now = new Date();
  const frame = em.create(Frame, {
    project,
    name: input.name,
    document,
    version: 1,
    memberCount,
    savedAt: now,
    savedBy: em.getReference(User, userId),
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

/**
 * Optimistic locking with a row lock for the check itself: the frame row is locked, its version compared with
 * the one the client started from, and only then is the old document kept as a revision and the new one stored.
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
    tem.create(FrameRevision, {
      frame,
      version: frame.version,
      document: frame.document,
      memberCount: frame.memberCount,
      savedAt: frame.savedAt,
      savedBy: frame.savedBy ?? null,
    });
    const now = new Date();
    frame.document = checked.document;
    frame.memberCount = checked.memberCount;
    frame.version = baseVersion + 1;
    frame.savedAt = now;
    frame.savedBy = tem.getReference(User, userId);
    await tem.flush();
    await touchProject(tem, frame.project.id, now);
    await recordActivity(tem, { projectId: frame.project.id, userId, kind: 'frame.saved', subject: frame.name, groupKey: frame.id });
    return { version: frame.version, updatedAt: frame.updatedAt.toISOString() };
  });
}

/** Newest first; the first entry is the frame's current version. */
export async function listRevisions(em: EntityManager, frame: FrameEntity): Promise<RevisionSummary[]> {
  await em.populate(frame, ['savedBy']);
  const older = await em.find(
    FrameRevision,
    { frame: frame.id },
    { exclude: ['document'], populate: ['savedBy'], orderBy: { version: 'desc' } },
  );
  return [
    { version: frame.version, savedAt: frame.savedAt.toISOString(), savedBy: userRef(frame.savedBy), memberCount: frame.memberCount, current: true },
    ...older.map((r) => ({
      version: r.version,
      savedAt: r.savedAt.toISOString(),
      savedBy: userRef(r.savedBy),
      memberCount: r.memberCount,
      current: false,
    })),
  ];
}

export async function getRevision(em: EntityManager, frame: FrameEntity, version: number): Promise<Revision> {
  if (version === frame.version) {
    await em.populate(frame, ['savedBy']);
    return { version, document: frame.document, savedAt: frame.savedAt.toISOString(), savedBy: userRef(frame.savedBy) };
  }
  const r = await em.findOne(FrameRevision, { frame: frame.id, version }, { populate: ['savedBy'] });
  if (!r) throw new NotFoundError('Revision', { version: `No version ${version} of this frame` });
  return { version: r.version, document: r.document, savedAt: r.savedAt.toISOString(), savedBy: userRef(r.savedBy) };
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
