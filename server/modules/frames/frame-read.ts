import type { Request } from 'express';
import type { EntityManager } from '@mikro-orm/postgresql';
import { can, type Action, type Role } from '@shared/api/roles';
import { ForbiddenError, NotFoundError } from '../../errors';

// GET /api/frames/:id without the three passes over the document (PostgreSQL's JSON parse, the ORM's change
// tracking, Express's stringify): the facts and the caller's role in one small query, the document as the text
// PostgreSQL stores, spliced into the answer. An unchanged frame costs the small query and a 304.

export type FrameHead = {
  id: string;
  projectId: string;
  workshopId: string;
  name: string;
  version: number;
  memberCount: number;
  role: Role;
  updatedAt: string;
  updatedBy: { id: string; name: string } | null;
  deletedAt: string | null;
};
/** With the names the shop documents print, which the API's Frame answer leaves out. */
export type FrameFacts = FrameHead & { projectName: string; workshopName: string };

type HeadRow = {
  id: string;
  project_id: string;
  workshop_id: string;
  name: string;
  version: number;
  member_count: number;
  updated_at: Date;
  deleted_at: Date | null;
  saved_by_id: string | null;
  saved_by_name: string | null;
  role: Role | null;
  project_name: string;
  workshop_name: string;
};

/** The frame's facts for a reader, with the same answers as authorizeFrame: 404 to non-members, 403 without the role. */
export async function frameHead(em: EntityManager, userId: string, frameId: string, action: Action = 'read'): Promise<FrameFacts> {
  const rows = await em.getConnection().execute<HeadRow[]>(
    `select f.id, f.project_id, p.workshop_id, f.name, f.version, f.member_count, f.updated_at, f.deleted_at,
            f.saved_by_id, u.name as saved_by_name,
            coalesce(m.role, case when exists (select 1 from project_clients c where c.project_id = p.id and c.user_id = ?)
                                  then 'client' end) as role,
            p.name as project_name, w.name as workshop_name
       from frames f
       join projects p on p.id = f.project_id and p.deleted_at is null
       join workshops w on w.id = p.workshop_id
       left join memberships m on m.workshop_id = p.workshop_id and m.user_id = ?
       left join users u on u.id = f.saved_by_id
      where f.id = ? and f.deleted_at is null`,
    [userId, userId, frameId],
  );
  const r = rows[0];
  if (!r || !r.role) throw new NotFoundError('Frame');
  // The same answers as the access path: a deleted frame is in the bin only, and a client is told 404, not 403.
  if (!can(r.role, action)) {
    if (r.role === 'client') throw new NotFoundError('Frame');
    throw new ForbiddenError();
  }
  const at = (d: Date | string) => new Date(d).toISOString();
  return {
    id: r.id,
    projectId: r.project_id,
    workshopId: r.workshop_id,
    name: r.name,
    version: r.version,
    memberCount: r.member_count,
    role: r.role,
    updatedAt: at(r.updated_at),
    updatedBy: r.saved_by_id ? { id: r.saved_by_id, name: r.saved_by_name ?? '' } : null,
    deletedAt: r.deleted_at ? at(r.deleted_at) : null,
    projectName: r.project_name,
    workshopName: r.workshop_name,
  };
}

/**
 * Changes whenever anything in the answer does: the document (its version), the name and deletion (updatedAt),
 * and the caller's role, so one member's copy never answers for another's.
 */
export function frameEtag(h: FrameHead): string {
  return `W/"${h.id}.${h.version}.${Date.parse(h.updatedAt)}.${h.role}.${h.updatedBy?.name.length ?? 0}"`;
}

export function notModified(req: Request, etag: string): boolean {
  const header = req.headers['if-none-match'];
  if (!header) return false;
  return header.split(',').some((t) => t.trim() === etag || t.trim() === '*');
}

/** The stored document as PostgreSQL writes it out (jsonb's text form is JSON). */
export async function frameDocumentText(em: EntityManager, frameId: string): Promise<string> {
  const rows = await em.getConnection().execute<{ document: string }[]>('select document::text as document from frames where id = ?', [frameId]);
  if (!rows[0]) throw new NotFoundError('Frame');
  return rows[0].document;
}

/** The API's Frame answer with the document spliced in as text. */
export function frameJson(h: FrameHead, documentText: string): string {
  const { id, projectId, workshopId, name, version, memberCount, role, updatedAt, updatedBy, deletedAt } = h;
  const facts = JSON.stringify({ id, projectId, workshopId, name, version, memberCount, role, updatedAt, updatedBy, deletedAt } satisfies FrameHead);
  return `${facts.slice(0, -1)},"document":${documentText}}`;
}
