import { Router, type Request } from 'express';
import { offcutParamsSchema } from '@shared/api/shop';
import { workshopParamsSchema } from '@shared/api/workshops';
import type { Orm } from '../../db';
import { NotFoundError } from '../../errors';
import { currentUserId } from '../../http/current-user';
import { parseInput } from '../../validate';
import { authorizeWorkshop } from '../access/access.service';
import { singleFile, uploadedText } from '../orders/upload';
import { deleteOffcut, importCustomProfiles, importOffcuts, listCustomProfiles, listOffcuts } from './stock.service';

const MAX_CSV_BYTES = 1024 * 1024;

export function stockRouter(orm: Orm): Router {
  const router = Router();
  const mayImport = (req: Request) => {
    const { workshopId } = parseInput(workshopParamsSchema, req.params, 'params');
    return authorizeWorkshop(orm.em, currentUserId(req), workshopId, 'project.write');
  };

  router.get('/workshops/:workshopId/offcuts', async (req, res) => {
    const { workshopId } = parseInput(workshopParamsSchema, req.params, 'params');
    await authorizeWorkshop(orm.em, currentUserId(req), workshopId, 'read');
    res.json(await listOffcuts(orm.em, workshopId));
  });

  router.post('/workshops/:workshopId/offcuts/import', singleFile('file', MAX_CSV_BYTES, mayImport), async (req, res) => {
    const { workshopId } = parseInput(workshopParamsSchema, req.params, 'params');
    await authorizeWorkshop(orm.em, currentUserId(req), workshopId, 'project.write');
    res.json(await importOffcuts(orm.em, workshopId, uploadedText(req.file)));
  });

  router.delete('/workshops/:workshopId/offcuts/:offcutId', async (req, res) => {
    const { workshopId, offcutId } = parseInput(offcutParamsSchema, req.params, 'params');
    await authorizeWorkshop(orm.em, currentUserId(req), workshopId, 'project.write');
    if (!(await deleteOffcut(orm.em, workshopId, offcutId))) throw new NotFoundError('Offcut');
    res.status(204).end();
  });

  router.get('/workshops/:workshopId/custom-profiles', async (req, res) => {
    const { workshopId } = parseInput(workshopParamsSchema, req.params, 'params');
    await authorizeWorkshop(orm.em, currentUserId(req), workshopId, 'read');
    res.json(await listCustomProfiles(orm.em, workshopId));
  });

  router.post('/workshops/:workshopId/custom-profiles/import', singleFile('file', MAX_CSV_BYTES, mayImport), async (req, res) => {
    const { workshopId } = parseInput(workshopParamsSchema, req.params, 'params');
    await authorizeWorkshop(orm.em, currentUserId(req), workshopId, 'project.write');
    res.json(await importCustomProfiles(orm.em, workshopId, uploadedText(req.file)));
  });

  return router;
}
