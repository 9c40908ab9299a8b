import type { EntityManager } from '@mikro-orm/postgresql';
import type { FrameReport } from '@shared/engine/report';
import { planShop, type ShelfOffcut, type ShopPlanResult, type ShopSettings, type StockOffer } from '@shared/shop/shop-plan';
import type { ShopMeta, ShopUnits } from '@shared/shop/types';
import { UnprocessableError } from '../../errors';
import type { WorkerPool } from '../../workers/pool';
import type { FrameEntity } from '../frames/frame.entity';
import { StockOffcut } from '../stock/stock-offcut.entity';
import { Supplier, type SupplierEntity } from '../suppliers/supplier.entity';
import { Workshop } from '../workshops/workshop.entity';
import { workshopSettings } from '../workshops/workshop-settings.service';
import { ensureMipSolver } from './mip';

// Everything the shop outputs of one frame need: its report, the plan against a supplier's bars and the shelf,
// and the facts printed on every page.

/**
 * With the drawers', panels' and countertop's hardware and mass, so the shop's lists match the editor's; worked out
 * in a worker thread (../../workers/report.task). An unreadable document is an InputError.
 */
export function frameReport(frame: FrameEntity, workers: WorkerPool): Promise<FrameReport> {
  return workers.run<FrameReport>({ task: 'frameReport', document: frame.document });
}

export function today(): string {
  return new Date().toISOString().slice(0, 10);
}

export async function shopMeta(em: EntityManager, frame: FrameEntity, report: FrameReport, opts: { paper?: 'A4' | 'LETTER'; units?: ShopUnits } = {}): Promise<ShopMeta> {
  const workshop = await em.findOneOrFail(Workshop, { id: frame.project.workshop.id });
  return {
    project: frame.project.name,
    frame: frame.name,
    revision: frame.version,
    date: today(),
    workshop: workshop.name,
    units: { ...report.units, ...opts.units },
    paper: opts.paper ?? 'A4',
  };
}

/** The supplier's bars; with no supplier, the bars the workshop says it usually buys (for any profile). */
export function offersOf(supplier: SupplierEntity | null, workshopStock: readonly { length_mm: number; price: number }[] = []): StockOffer[] {
  if (!supplier) return workshopStock.map((s) => ({ profileId: null, length_mm: s.length_mm, price: s.price }));
  return supplier.stock.map((s) => ({ profileId: s.profile, length_mm: s.length_mm, price: s.price }));
}

/** Trim and shortest offcut for a plan: what the request asks, else the frame's own (which new frames take from the workshop). */
export function shopSettingsFor(report: FrameReport, asked: { trim_mm?: number; minOffcut_mm?: number } = {}): ShopSettings {
  return { trim_mm: asked.trim_mm ?? report.settings.trim_mm, minOffcut_mm: asked.minOffcut_mm ?? report.settings.min_offcut_mm };
}

export async function shelfOf(em: EntityManager, workshopId: string): Promise<ShelfOffcut[]> {
  const rows = await em.find(StockOffcut, { workshop: workshopId });
  return rows.map((r) => ({ profileId: r.profile, length_mm: Number(r.lengthMm), qty: r.qty }));
}

/** The workshop's supplier by id (404 unless it is theirs), or its first supplier, or none. */
export async function supplierFor(em: EntityManager, workshopId: string, supplierId: string | undefined): Promise<SupplierEntity | null> {
  if (supplierId) {
    const s = await em.findOne(Supplier, { id: supplierId, workshop: workshopId, deletedAt: null });
    if (!s) throw new UnprocessableError('That supplier is not one of this workshop’s', { supplierId: 'Unknown supplier' });
    return s;
  }
  return em.findOne(Supplier, { workshop: workshopId, deletedAt: null }, { orderBy: { name: 'asc' } });
}

export async function planFrame(
  em: EntityManager,
  frame: FrameEntity,
  report: FrameReport,
  opts: { supplier: SupplierEntity | null; useShelf: boolean; trim_mm?: number; minOffcut_mm?: number; timeLimitMs: number },
): Promise<ShopPlanResult> {
  if (report.cut_list.length === 0) throw new UnprocessableError('This frame has no members to cut yet');
  const shelf = opts.useShelf ? await shelfOf(em, frame.project.workshop.id) : [];
  const stock = opts.supplier ? [] : (await workshopSettings(em, frame.project.workshop.id)).stock;
  await ensureMipSolver();
  return planShop(report, offersOf(opts.supplier, stock), shelf, shopSettingsFor(report, opts), opts.timeLimitMs);
}
