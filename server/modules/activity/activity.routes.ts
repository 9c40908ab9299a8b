import { Router } from 'express';
import type { ActivityEntry } from '@shared/api/activity';
import { projectParamsSchema } from '@shared/api/projects';
import type { Orm } from '../../db';
import { currentUserId } from '../../http/current-user';
import { parseInput } from '../../validate';
import { authorizeProject } from '../access/access.service';
import { listActivity } from './activity.service';

export function activityRouter(orm: Orm): Router {
  const router = Router();
  // The shop's own record (orders sent, cuts ticked, who was invited): not for the project's clients.
  router.get('/projects/:projectId/activity', async (req, res) => {
    const { projectId } = parseInput(projectParamsSchema, req.params, 'params');
    await authorizeProject(orm.em, currentUserId(req), projectId, 'shop.read');
    res.json((await listActivity(orm.em, projectId)) satisfies ActivityEntry[]);
  });
  return router;
}
