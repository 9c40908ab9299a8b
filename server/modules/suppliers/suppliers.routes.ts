import { Router } from 'express';
import { supplierInputSchema, supplierParamsSchema, supplierPatchSchema } from '@shared/api/shop';
import { workshopParamsSchema } from '@shared/api/workshops';
import type { Orm } from '../../db';
import { currentUserId } from '../../http/current-user';
import { parseInput } from '../../validate';
import { asNotFound, authorizeWorkshop } from '../access/access.service';
import { createSupplier, deleteSupplier, findSupplier, listSuppliers, updateSupplier } from './suppliers.service';

export function suppliersRouter(orm: Orm): Router {
  const router = Router();

  router.get('/workshops/:workshopId/suppliers', async (req, res) => {
    const { workshopId } = parseInput(workshopParamsSchema, req.params, 'params');
    await authorizeWorkshop(orm.em, currentUserId(req), workshopId, 'read');
    res.json(await listSuppliers(orm.em, workshopId));
  });

  router.post('/workshops/:workshopId/suppliers', async (req, res) => {
    const { workshopId } = parseInput(workshopParamsSchema, req.params, 'params');
    await authorizeWorkshop(orm.em, currentUserId(req), workshopId, 'project.write');
    res.status(201).json(await createSupplier(orm.em, workshopId, parseInput(supplierInputSchema, req.body)));
  });

  router.patch('/suppliers/:supplierId', async (req, res) => {
    const { supplierId } = parseInput(supplierParamsSchema, req.params, 'params');
    const userId = currentUserId(req);
    const s = await findSupplier(orm.em, supplierId);
    await asNotFound('Supplier', authorizeWorkshop(orm.em, userId, s.workshop.id, 'project.write'));
    res.json(await updateSupplier(orm.em, s, parseInput(supplierPatchSchema, req.body)));
  });

  router.delete('/suppliers/:supplierId', async (req, res) => {
    const { supplierId } = parseInput(supplierParamsSchema, req.params, 'params');
    const userId = currentUserId(req);
    const s = await findSupplier(orm.em, supplierId);
    await asNotFound('Supplier', authorizeWorkshop(orm.em, userId, s.workshop.id, 'project.write'));
    await deleteSupplier(orm.em, s);
    res.status(204).end();
  });

  return router;
}
