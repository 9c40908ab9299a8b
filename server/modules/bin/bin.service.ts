import type { QueryResult } from '@mikro-orm/core';
import type { EntityManager } from '@mikro-orm/postgresql';
import { BIN_DAYS, purgeAt, type BinEntry } from '@shared/api/bin';
import type { UserEntity } from '../users/user.entity';
import { binCutoff } from '../access/access.service';
import { Frame } from '../frames/frame.entity';
import { Project } from '../projects/project.entity';
import { liveFrameCounts } from '../projects/projects.service';

// What has been in the bin longer than BIN_DAYS is deleted for good (frames with their revisions and cutting
// state, projects with everything in them, by the foreign keys' cascades). Run lazily by the bin's own routes
// and on a timer by the server, so no outside scheduler is needed; until then the access path treats an expired
// row as gone already.

export async function purgeBin(em: EntityManager): Promise<{ projects: number; frames: number }> {
  const conn = em.getConnection();
  const frames = await conn.execute<QueryResult>(`delete from frames where deleted_at < now() - make_interval(days => ?)`, [BIN_DAYS], 'run');
  const projects = await conn.execute<QueryResult>(`delete from projects where deleted_at < now() - make_interval(days => ?)`, [BIN_DAYS], 'run');
  return { projects: Number(projects.affectedRows ?? 0), frames: Number(frames.affectedRows ?? 0) };
}

const who = (u: UserEntity | null | undefined) => (u ? { id: u.id, name: u.name } : null);

/** The workshop's bin, newest deletion first: deleted projects, and deleted frames of live projects. */
export async function listBin(em: EntityManager, workshopId: string): Promise<BinEntry[]> {
  await purgeBin(em);
  const since = binCutoff();
  const projects = await em.find(Project, { workshop: workshopId, deletedAt: { $gt: since } }, { populate: ['deletedBy'] });
  const frames = await em.find(
    Frame,
    { deletedAt: { $gt: since }, project: { workshop: workshopId, deletedAt: null } },
    { exclude: ['document'], populate: ['project', 'deletedBy'] },
  );
  const counts = await liveFrameCounts(em, projects.map((p) => p.id));
  const entries: BinEntry[] = [
    ...projects.map((p) => ({
      kind: 'project' as const,
      id: p.id,
      name: p.name,
      projectId: p.id,
      projectName: p.name,
      frameCount: counts.get(p.id) ?? 0,
      deletedAt: p.deletedAt!.toISOString(),
      deletedBy: who(p.deletedBy),
      purgeAt: purgeAt(p.deletedAt!).toISOString(),
    })),
    ...frames.map((f) => ({
      kind: 'frame' as const,
      id: f.id,
      name: f.name,
      projectId: f.project.id,
      projectName: f.project.name,
      frameCount: 1,
      deletedAt: f.deletedAt!.toISOString(),
      deletedBy: who(f.deletedBy),
      purgeAt: purgeAt(f.deletedAt!).toISOString(),
    })),
  ];
  return entries.sort((a, b) => b.deletedAt.localeCompare(a.deletedAt));
}
