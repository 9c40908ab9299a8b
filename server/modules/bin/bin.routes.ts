import { Router } from 'express';
import type { BinEntry } from '@shared/api/bin';
import type { ProjectSummary } from '@shared/api/projects';
import { projectParamsSchema } from '@shared/api/projects';
import { workshopParamsSchema } from '@shared/api/workshops';
import type { Orm } from '../../db';
import { currentUserId } from '../../http/current-user';
import { parseInput } from '../../validate';
import { authorizeBinnedProject, authorizeWorkshop } from '../access/access.service';
import { restoreProject } from '../projects/projects.service';
import { listBin, purgeBin } from './bin.service';

// The bin is for those who may restore from it (owners and designers); frames are restored through
// POST /api/frames/:frameId/restore.
export function binRouter(orm: Orm): Router {
  const router = Router();

  router.get('/workshops/:workshopId/bin', async (req, res) => {
    const { workshopId } = parseInput(workshopParamsSchema, req.params, 'params');
    await authorizeWorkshop(orm.em, currentUserId(req), workshopId, 'project.write');
    res.json((await listBin(orm.em, workshopId)) satisfies BinEntry[]);
  });

  router.post('/projects/:projectId/restore', async (req, res) => {
    const { projectId } = parseInput(projectParamsSchema, req.params, 'params');
    await purgeBin(orm.em);
    const project = await authorizeBinnedProject(orm.em, currentUserId(req), projectId);
    res.json((await restoreProject(orm.em, project)) satisfies ProjectSummary);
  });

  return router;
}

/** Purges the bin now and then every `everyMs` (the timer does not keep the process alive). */
export function scheduleBinPurge(orm: Orm, everyMs: number, onError: (err: unknown) => void): () => void {
  const run = () => void purgeBin(orm.em.fork()).catch(onError);
  run();
  const timer = setInterval(run, everyMs).unref();
  return () => clearInterval(timer);
}
