import { randomUUID } from 'node:crypto';
import bcrypt from 'bcryptjs';
import type { FrameDocumentJson } from '@shared/api/frames';
import type { Role, WorkshopRole } from '@shared/api/roles';
import { parseFrameDocument } from '@shared/model/parse';
import type { Orm } from '../../server/db';
import { FrameRevision } from '../../server/modules/frames/frame-revision.entity';
import { Frame, type FrameEntity } from '../../server/modules/frames/frame.entity';
import { Project, type ProjectEntity } from '../../server/modules/projects/project.entity';
import { User, type UserEntity } from '../../server/modules/users/user.entity';
import { Membership } from '../../server/modules/workshops/membership.entity';
import { Workshop, type WorkshopEntity } from '../../server/modules/workshops/workshop.entity';

// Rows written straight through the ORM, for tests that need data to exist before the request under test.

export const DEFAULT_PASSWORD = 'correct horse battery';

const hashes = new Map<string, string>();
/** Hashing at the production cost takes a few hundred ms, so each distinct password is hashed once per run. */
function hashFor(password: string): string {
  let h = hashes.get(password);
  if (!h) {
    h = bcrypt.hashSync(password, 12);
    hashes.set(password, h);
  }
  return h;
}

export function uniqueEmail(prefix = 'user'): string {
  return `${prefix}-${randomUUID().slice(0, 8)}@example.test`;
}

export async function makeUser(
  orm: Orm,
  opts: { email?: string; name?: string; password?: string } = {},
): Promise<UserEntity & { password: string }> {
  const em = orm.em.fork();
  const password = opts.password ?? DEFAULT_PASSWORD;
  const email = (opts.email ?? uniqueEmail()).toLowerCase();
  const user = em.create(User, { email, name: opts.name ?? email.split('@')[0], passwordHash: hashFor(password) });
  await em.flush();
  return Object.assign(user, { password });
}

export async function makeWorkshop(
  orm: Orm,
  members: { user: UserEntity; role: Role }[],
  name = `Workshop ${randomUUID().slice(0, 6)}`,
): Promise<WorkshopEntity> {
  const em = orm.em.fork();
  const workshop = em.create(Workshop, { name });
  for (const m of members) em.create(Membership, { workshop, user: em.getReference(User, m.user.id), role: m.role as WorkshopRole });
  await em.flush();
  return workshop;
}

export async function makeProject(
  orm: Orm,
  workshop: WorkshopEntity,
  opts: { name?: string; client?: string; notes?: string; deletedAt?: Date } = {},
): Promise<ProjectEntity> {
  const em = orm.em.fork();
  const project = em.create(Project, {
    workshop: em.getReference(Workshop, workshop.id),
    name: opts.name ?? `Project ${randomUUID().slice(0, 6)}`,
    client: opts.client ?? '',
    notes: opts.notes ?? '',
    deletedAt: opts.deletedAt ?? null,
  });
  await em.flush();
  return project;
}

/**
 * A valid frame document with `memberCount` rails (as the document model parses it, defaults filled in, which is
 * also how the server stores it). `tag` makes the member ids, and so the document, differ between calls.
 */
export function sampleDocument(memberCount = 2, tag = 'a'): FrameDocumentJson {
  return parseFrameDocument({
    schemaVersion: 1,
    members: Array.from({ length: memberCount }, (_, i) => ({
      type: 'member',
      id: `${tag}${i}`,
      profile: '40x40-s8',
      axis: 'x',
      start: { offset_mm: 0 },
      length_mm: 500 + i,
      // Rows of 900 rails, stacked 100 mm apart, keep a big frame within the 100 m bound on every offset.
      place: i < 900 ? { z: { offset_mm: 100 * i } } : { y: { offset_mm: 100 * Math.floor(i / 900) }, z: { offset_mm: 100 * (i % 900) } },
    })),
  }) as unknown as FrameDocumentJson;
}

export async function makeFrame(
  orm: Orm,
  project: ProjectEntity,
  opts: { name?: string; document?: FrameDocumentJson; savedBy?: UserEntity; deletedAt?: Date } = {},
): Promise<FrameEntity> {
  const em = orm.em.fork();
  const document = opts.document ?? sampleDocument();
  const frame = em.create(Frame, {
    project: em.getReference(Project, project.id),
    name: opts.name ?? `Frame ${randomUUID().slice(0, 6)}`,
    document,
    version: 1,
    memberCount: Array.isArray(document.members) ? document.members.length : 0,
    savedAt: new Date(),
    savedBy: opts.savedBy ? em.getReference(User, opts.savedBy.id) : null,
    deletedAt: opts.deletedAt ?? null,
  });
  await em.flush();
  return frame;
}

/** What the database holds for a frame right now (fresh read, no identity map). */
export async function storedFrame(orm: Orm, frameId: string) {
  const em = orm.em.fork();
  const frame = await em.findOneOrFail(Frame, { id: frameId });
  const revisions = await em.find(FrameRevision, { frame: frameId }, { orderBy: { version: 'asc' } });
  return {
    version: frame.version,
    name: frame.name,
    document: frame.document,
    memberCount: frame.memberCount,
    deletedAt: frame.deletedAt,
    revisions: revisions.map((r) => ({ version: r.version, document: r.document, memberCount: r.memberCount })),
  };
}
