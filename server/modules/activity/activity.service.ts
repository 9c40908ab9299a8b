import { randomUUID } from 'node:crypto';
import { raw, type EntityManager } from '@mikro-orm/postgresql';
import type { ActivityEntry, ActivityKind } from '@shared/api/activity';
import { Project } from '../projects/project.entity';
import { User } from '../users/user.entity';
import { Activity } from './activity.entity';

/** Repeats by one person on one thing within this stretch are counted on one entry. */
export const GROUP_WINDOW_MS = 10 * 60_000;
const GROUPED: ReadonlySet<ActivityKind> = new Set(['frame.saved', 'cuts.ticked']);

export async function recordActivity(
  em: EntityManager,
  e: { projectId: string; userId: string | null; kind: ActivityKind; subject: string; groupKey?: string },
): Promise<void> {
  const now = new Date();
  const groupKey = e.groupKey ?? '';
  if (GROUPED.has(e.kind) && groupKey) {
    const n = await em.nativeUpdate(
      Activity,
      { project: e.projectId, user: e.userId, kind: e.kind, groupKey, lastAt: { $gt: new Date(now.getTime() - GROUP_WINDOW_MS) } },
      { count: raw('count + 1') as unknown as number, lastAt: now, subject: e.subject },
    );
    if (n > 0) return;
  }
  await em.insert(Activity, {
    id: randomUUID(),
    project: em.getReference(Project, e.projectId),
    user: e.userId ? em.getReference(User, e.userId) : null,
    kind: e.kind,
    subject: e.subject,
    groupKey,
    count: 1,
    firstAt: now,
    lastAt: now,
  });
}

export async function listActivity(em: EntityManager, projectId: string, limit = 100): Promise<ActivityEntry[]> {
  const rows = await em.find(Activity, { project: projectId }, { populate: ['user'], orderBy: { lastAt: 'desc' }, limit });
  return rows.map((r) => ({
    id: r.id,
    kind: r.kind,
    subject: r.subject,
    count: r.count,
    firstAt: r.firstAt.toISOString(),
    lastAt: r.lastAt.toISOString(),
    user: r.user ? { id: r.user.id, name: r.user.name } : null,
  }));
}
