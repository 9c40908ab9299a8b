import { Router } from 'express';
import type { ProjectDetail, ProjectSummary } from '@shared/api/projects';
import { createProjectRequestSchema, projectParamsSchema, updateProjectRequestSchema } from '@shared/api/projects';
import { workshopParamsSchema } from '@shared/api/workshops';
import type { Orm } from '../../db';
import { currentUserId } from '../../http/current-user';
import { parseInput } from '../../validate';
import { authorizeProject, authorizeWorkshop } from '../access/access.service';
import { createProject, deleteProject, listProjects, projectDetail, updateProject } from './projects.service';

export function projectsRouter(orm: Orm): Router {
  const router = Router();

  router.get('/workshops/:workshopId/projects', async (req, res) => {
    const userId = currentUserId(req);
    const { workshopId } = parseInput(workshopParamsSchema, req.params, 'params');
    await authorizeWorkshop(orm.em, userId, workshopId, 'read');
    res.json((await listProjects(orm.em, workshopId)) satisfies ProjectSummary[]);
  });

  router.post('/workshops/:workshopId/projects', async (req, res) => {
    const userId = currentUserId(req);
    const { workshopId } = parseInput(workshopParamsSchema, req.params, 'params');
    await authorizeWorkshop(orm.em, userId, workshopId, 'project.write');
    const input = parseInput(createProjectRequestSchema, req.body);
    res.status(201).json((await createProject(orm.em, workshopId, input)) satisfies ProjectSummary);
  });

  router.get('/projects/:projectId', async (req, res) => {
    const userId = currentUserId(req);
    const { projectId } = parseInput(projectParamsSchema, req.params, 'params');
    const { project, role } = await authorizeProject(orm.em, userId, projectId, 'read');
    res.json((await projectDetail(orm.em, project, role)) satisfies ProjectDetail);
  });

  router.patch('/projects/:projectId', async (req, res) => {
    const userId = currentUserId(req);
    const { projectId } = parseInput(projectParamsSchema, req.params, 'params');
    const { project } = await authorizeProject(orm.em, userId, projectId, 'project.write');
    const input = parseInput(updateProjectRequestSchema, req.body);
    res.json((await updateProject(orm.em, project, input)) satisfies ProjectSummary);
  });

  router.delete('/projects/:projectId', async (req, res) => {
    const userId = currentUserId(req);
    const { projectId } = parseInput(projectParamsSchema, req.params, 'params');
    const { project } = await authorizeProject(orm.em, userId, projectId, 'project.delete');
    await deleteProject(orm.em, project, userId);
    res.status(204).end();
  });

  return router;
}
