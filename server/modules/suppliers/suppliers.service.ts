import type { EntityManager } from '@mikro-orm/postgresql';
import type { Supplier as SupplierView, SupplierInput } from '@shared/api/shop';
import type { z } from 'zod';
import type { supplierInputSchema, supplierPatchSchema } from '@shared/api/shop';
import { NotFoundError } from '../../errors';
import { Workshop } from '../workshops/workshop.entity';
import { Supplier, type SupplierEntity } from './supplier.entity';

export function toSupplierView(s: SupplierEntity): SupplierView {
  return {
    id: s.id,
    name: s.name,
    email: s.email,
    currency: s.currency,
    stock: s.stock,
    cutFee: Number(s.cutFee),
    notes: s.notes,
    updatedAt: s.updatedAt.toISOString(),
  };
}

export async function listSuppliers(em: EntityManager, workshopId: string): Promise<SupplierView[]> {
  const rows = await em.find(Supplier, { workshop: workshopId, deletedAt: null }, { orderBy: { name: 'asc' } });
  return rows.map(toSupplierView);
}

export async function createSupplier(em: EntityManager, workshopId: string, input: z.output<typeof supplierInputSchema>): Promise<SupplierView> {
  const s = em.create(Supplier, { workshop: em.getReference(Workshop, workshopId), ...input });
  await em.flush();
  return toSupplierView(s);
}

export async function findSupplier(em: EntityManager, supplierId: string): Promise<SupplierEntity> {
  const s = await em.findOne(Supplier, { id: supplierId, deletedAt: null });
  if (!s) throw new NotFoundError('Supplier');
  return s;
}

export async function updateSupplier(em: EntityManager, s: SupplierEntity, input: z.output<typeof supplierPatchSchema>): Promise<SupplierView> {
  em.assign(s, Object.fromEntries(Object.entries(input).filter(([, v]) => v !== undefined)) as Partial<SupplierInput>);
  await em.flush();
  return toSupplierView(s);
}

/** Soft delete: orders already made keep naming the supplier. */
export async function deleteSupplier(em: EntityManager, s: SupplierEntity): Promise<void> {
  s.deletedAt = new Date();
  await em.flush();
}
