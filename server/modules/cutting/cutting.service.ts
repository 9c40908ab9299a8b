import { Frame } from '../frames/frame.entity';
import { recordActivity } from '../activity/activity.service';
import { randomUUID } from 'node:crypto';
import type { EntityManager } from '@mikro-orm/postgresql';
import { can, type Role } from '@shared/api/roles';
import type { CutSessionPlan, CuttingState } from '@shared/api/shop';
import { planCutKeys } from '@shared/api/cut-plan';
import { cuttingKey } from '@shared/engine/cutting-key';
import { diffReports } from '@shared/engine/diff';
import type { FrameReport } from '@shared/engine/report';
import { InputError } from '@shared/errors';
import { UnprocessableError } from '../../errors';
import type { WorkerPool } from '../../workers/pool';
import type { FrameEntity } from '../frames/frame.entity';
import { frameReport, planFrame, shopSettingsFor, supplierFor } from '../orders/frame-shop.service';
import { PLAN_TIME_LIMIT_MS } from '../orders/orders.service';
import { User } from '../users/user.entity';
import { CutSession, type CutSessionEntity } from './cut-session.entity';
import { CutTick } from './cut-tick.entity';

// Cutting at the saw: a plan frozen per frame when cutting starts, and ticks on its cuts. The latest session of a
// frame is the live one; starting again (after a design change) begins a new session with no ticks.

export async function latestSession(em: EntityManager, frameId: string): Promise<CutSessionEntity | null> {
  return em.findOne(CutSession, { frame: frameId }, { orderBy: { startedAt: 'desc' }, populate: ['startedBy'], refresh: true });
}

/** The live session's id and frame version, without its plan: enough to tell whether a saved saw list still holds. */
export async function latestSessionKey(em: EntityManager, frameId: string): Promise<string | null> {
  const rows = await em
    .getConnection()
    .execute<{ id: string; frame_version: number }[]>('select id, frame_version from cut_sessions where frame_id = ? order by started_at desc limit 1', [frameId]);
  return rows[0] ? `${rows[0].id}@${rows[0].frame_version}` : null;
}

async function reportOrNull(frame: FrameEntity, workers: WorkerPool): Promise<FrameReport | null> {
  try {
    return await frameReport(frame, workers);
  } catch (err) {
    // Only a document the engine cannot read; a busy pool (503) is the caller's to hear about.
    if (err instanceof InputError) return null;
    throw err;
  }
}

export async function cuttingState(em: EntityManager, workers: WorkerPool, frame: FrameEntity, role: Role): Promise<CuttingState> {
  const session = await latestSession(em, frame.id);
  const ticks = session ? await em.find(CutTick, { session: session.id }, { orderBy: { tickedAt: 'asc' }, populate: ['tickedBy'] }) : [];
  let reuse: CuttingState['reuse'] = null;
  const report = await reportOrNull(frame, workers);
  // A design the engine cannot read has nothing in common with the one being cut.
  const currentKey = report ? cuttingKey(report.members) : `unreadable-${frame.version}`;
  const sessionKey = session ? cuttingKey(session.plan.members) : null;
  if (session && report && sessionKey !== currentKey && ticks.length > 0) {
    // The parts already cut (the first n members of each ticked mark) are the old parts; the current design's
    // report is the new one: the engine's what-changed diff says what to keep, re-cut and cut new.
    const count = new Map<string, number>();
    for (const t of ticks) count.set(t.mark, (count.get(t.mark) ?? 0) + 1);
    const cut = session.plan.members.filter((m) => {
      const left = count.get(m.mark) ?? 0;
      if (left <= 0) return false;
      count.set(m.mark, left - 1);
      return true;
    });
    try {
      reuse = diffReports({ members: cut.map((m) => ({ ...m })) } as Parameters<typeof diffReports>[0], report);
    } catch {
      reuse = null;
    }
  }
  return {
    frameId: frame.id,
    frameName: frame.name,
    projectName: frame.project.name,
    currentVersion: frame.version,
    currentCuttingKey: currentKey,
    session: session
      ? {
          id: session.id,
          frameVersion: session.frameVersion,
          cuttingKey: sessionKey!,
          startedAt: session.startedAt.toISOString(),
          startedBy: session.startedBy ? { id: session.startedBy.id, name: session.startedBy.name } : null,
          plan: session.plan,
        }
      : null,
    ticks: ticks.map((t) => ({ cutKey: t.cutKey, mark: t.mark, tickedBy: t.tickedBy ? { id: t.tickedBy.id, name: t.tickedBy.name } : null, tickedAt: t.tickedAt.toISOString() })),
    reuse,
    canTick: can(role, 'cuts.tick'),
    canRestart: can(role, 'frame.write'),
  };
}

/** Freezes the plan for the frame's current version (against the workshop's first supplier and the shelf). */
export async function startSession(
  em: EntityManager,
  workers: WorkerPool,
  frame: FrameEntity,
  userId: string,
  asked: { trim_mm?: number; minOffcut_mm?: number },
): Promise<CutSessionEntity> {
  const report = await frameReport(frame, workers);
  const supplier = await supplierFor(em, frame.project.workshop.id, undefined);
  const settings = shopSettingsFor(report, asked);
  const planned = await planFrame(em, frame, report, { supplier, useShelf: true, ...settings, timeLimitMs: PLAN_TIME_LIMIT_MS });
  const plan: CutSessionPlan = {
    frameName: frame.name,
    cutList: planned.cutList,
    plans: planned.plans,
    members: report.members.map((m) => ({ id: m.id, mark: m.mark, profile: m.profile, cut_length_mm: m.cut_length_mm })),
    settings,
    units: { display: report.units.display, frac: report.units.frac, mass: report.units.mass, date: report.units.date },
  };
  const s = em.create(CutSession, { frame, frameVersion: frame.version, plan, startedBy: em.getReference(User, userId) });
  await em.flush();
  return s;
}

/** A tick is idempotent: ticking a ticked cut changes nothing (two cutters may tap the same cut). */
export async function tick(em: EntityManager, frameId: string, userId: string, cutKey: string): Promise<void> {
  const session = await latestSession(em, frameId);
  if (!session) throw new UnprocessableError('Cutting has not started on this frame', { cutKey: 'No cutting plan yet' });
  const mark = planCutKeys(session.plan).get(cutKey);
  if (!mark) throw new UnprocessableError('No such cut in the cutting plan', { cutKey: 'Unknown cut' });
  await em
    .createQueryBuilder(CutTick)
    .insert({ id: randomUUID(), session: session.id, cutKey, mark, tickedBy: userId, tickedAt: new Date() })
    .onConflict(['session', 'cutKey'])
    .ignore()
    .execute();
  const frame = await em.findOne(Frame, { id: frameId }, { fields: ['name', 'project'] });
  if (frame) await recordActivity(em, { projectId: frame.project.id, userId, kind: 'cuts.ticked', subject: frame.name, groupKey: frameId });
}

export async function untick(em: EntityManager, frameId: string, cutKey: string): Promise<void> {
  const session = await latestSession(em, frameId);
  if (!session) return;
  await em.nativeDelete(CutTick, { session: session.id, cutKey });
}
