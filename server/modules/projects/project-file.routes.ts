import { Router, type Request } from 'express';
import { MAX_PROJECT_FILE_BYTES } from '@shared/api/project-file';
import type { ProjectSummary } from '@shared/api/projects';
import { projectParamsSchema } from '@shared/api/projects';
import { workshopParamsSchema } from '@shared/api/workshops';
import type { Orm } from '../../db';
import { ValidationError } from '../../errors';
import { currentUserId } from '../../http/current-user';
import { parseInput } from '../../validate';
import { clientGone, type WorkerPool } from '../../workers/pool';
import type { ProjectFileReading } from '../../workers/project-file.task';
import { authorizeProject, authorizeWorkshop } from '../access/access.service';
import { sendFile } from '../orders/orders.routes';
import { singleFile } from '../orders/upload';
import { exportProjectFile, importProjectFile } from './project-file.service';

// A whole project as one file, and such a file as a new project of any workshop the caller may write to. Both are
// for owners and designers: the file holds every revision and every file of the project.
export function projectFileRouter(orm: Orm, workers: WorkerPool): Router {
  const router = Router();

  router.get('/projects/:projectId/export', async (req, res) => {
    const { projectId } = parseInput(projectParamsSchema, req.params, 'params');
    const { project } = await authorizeProject(orm.em, currentUserId(req), projectId, 'project.write');
    sendFile(res, await exportProjectFile(orm.em, project), 'application/json; charset=utf-8', `${project.name}.slotwright.json`);
  });

  const mayImport = async (req: Request) => {
    const { workshopId } = parseInput(workshopParamsSchema, req.params, 'params');
    await authorizeWorkshop(orm.em, currentUserId(req), workshopId, 'project.write');
  };

  router.post('/workshops/:workshopId/projects/import', singleFile('file', MAX_PROJECT_FILE_BYTES, mayImport), async (req, res) => {
    const { workshopId } = parseInput(workshopParamsSchema, req.params, 'params');
    const userId = currentUserId(req);
    await authorizeWorkshop(orm.em, userId, workshopId, 'project.write');
    if (!req.file || req.file.size === 0) throw new ValidationError({ file: 'Choose a project file (.slotwright.json) to import' });
    const bytes = new Uint8Array(req.file.buffer.buffer, req.file.buffer.byteOffset, req.file.buffer.byteLength);
    const read = await workers.run<ProjectFileReading>({ task: 'readProjectFile', bytes }, clientGone(res));
    if (!read.ok) throw new ValidationError(read.fields, read.message);
    res.status(201).json((await importProjectFile(orm.em, workshopId, userId, read.file)) satisfies ProjectSummary);
  });

  return router;
}
