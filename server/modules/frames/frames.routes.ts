import { Router } from 'express';
import type { Frame, FrameSummary, Revision, RevisionComparison, RevisionSummary, SaveFrameDocumentResponse } from '@shared/api/frames';
import {
  compareRevisionsQuerySchema,
  createFrameRequestSchema,
  frameParamsSchema,
  keepRevisionRequestSchema,
  nameRevisionRequestSchema,
  restoreRevisionRequestSchema,
  listFramesQuerySchema,
  renameFrameRequestSchema,
  revisionParamsSchema,
  saveFrameDocumentRequestSchema,
} from '@shared/api/frames';
import { projectParamsSchema } from '@shared/api/projects';
import type { Orm } from '../../db';
import { clientGone, type WorkerPool } from '../../workers/pool';
import { currentUserId } from '../../http/current-user';
import { parseInput } from '../../validate';
import { can } from '@shared/api/roles';
import { authorizeBinnedFrame, authorizeFrame, authorizeProject } from '../access/access.service';
import { frameDocumentText, frameEtag, frameHead, frameJson, notModified } from './frame-read';
import {
  compareRevisions,
  createFrame,
  keepRevision,
  nameRevision,
  restoreRevision,
  deleteFrame,
  getRevision,
  listFrameSummaries,
  listRevisions,
  renameFrame,
  restoreFrame,
  saveFrameDocument,
} from './frames.service';

export function framesRouter(orm: Orm, workers: WorkerPool): Router {
  const router = Router();

  router.get('/projects/:projectId/frames', async (req, res) => {
    const userId = currentUserId(req);
    const { projectId } = parseInput(projectParamsSchema, req.params, 'params');
    const { deleted } = parseInput(listFramesQuerySchema, req.query, 'query');
    const { role } = await authorizeProject(orm.em, userId, projectId, 'read');
    // The project's part of the bin is for those who may restore from it; a client never sees the bin.
    if (deleted === 'true' && !can(role, 'frame.write')) return void res.json([] satisfies FrameSummary[]);
    res.json((await listFrameSummaries(orm.em, projectId, deleted === 'true')) satisfies FrameSummary[]);
  });

  router.post('/projects/:projectId/frames', async (req, res) => {
    const userId = currentUserId(req);
    const { projectId } = parseInput(projectParamsSchema, req.params, 'params');
    const { project, role } = await authorizeProject(orm.em, userId, projectId, 'frame.write');
    const input = parseInput(createFrameRequestSchema, req.body);
    res.status(201).json((await createFrame(orm.em, project, role, userId, input)) satisfies Frame);
  });

  router.get('/frames/:frameId', async (req, res) => {
    const userId = currentUserId(req);
    const { frameId } = parseInput(frameParamsSchema, req.params, 'params');
    const head = await frameHead(orm.em, userId, frameId);
    const etag = frameEtag(head);
    res.setHeader('ETag', etag);
    // Kept by the browser for this user only, and checked with the server before each use.
    res.setHeader('Cache-Control', 'private, no-cache');
    if (notModified(req, etag)) {
      res.status(304).end();
      return;
    }
    res.type('application/json').send(frameJson(head, await frameDocumentText(orm.em, frameId)));
  });

  router.patch('/frames/:frameId', async (req, res) => {
    const userId = currentUserId(req);
    const { frameId } = parseInput(frameParamsSchema, req.params, 'params');
    const { frame } = await authorizeFrame(orm.em, userId, frameId, 'frame.write');
    const { name } = parseInput(renameFrameRequestSchema, req.body);
    res.json((await renameFrame(orm.em, frame, name)) satisfies FrameSummary);
  });

  router.put('/frames/:frameId/document', async (req, res) => {
    const userId = currentUserId(req);
    const { frameId } = parseInput(frameParamsSchema, req.params, 'params');
    await authorizeFrame(orm.em, userId, frameId, 'frame.write');
    const { baseVersion, document } = parseInput(saveFrameDocumentRequestSchema, req.body);
    res.json((await saveFrameDocument(orm.em, frameId, userId, baseVersion, document)) satisfies SaveFrameDocumentResponse);
  });

  router.get('/frames/:frameId/revisions', async (req, res) => {
    const userId = currentUserId(req);
    const { frameId } = parseInput(frameParamsSchema, req.params, 'params');
    const { frame } = await authorizeFrame(orm.em, userId, frameId, 'read');
    res.json((await listRevisions(orm.em, frame)) satisfies RevisionSummary[]);
  });

  // Saving a revision ends the editing stretch: the caller must hold the version it means (409 otherwise).
  router.post('/frames/:frameId/revisions', async (req, res) => {
    const userId = currentUserId(req);
    const { frameId } = parseInput(frameParamsSchema, req.params, 'params');
    await authorizeFrame(orm.em, userId, frameId, 'frame.write');
    const { baseVersion, name } = parseInput(keepRevisionRequestSchema, req.body);
    res.json((await keepRevision(orm.em, frameId, baseVersion, name)) satisfies RevisionSummary);
  });

  // Before /revisions/:version, which would otherwise take "compare" for a version number.
  router.get('/frames/:frameId/revisions/compare', async (req, res) => {
    const userId = currentUserId(req);
    const { frameId } = parseInput(frameParamsSchema, req.params, 'params');
    const { from, to } = parseInput(compareRevisionsQuerySchema, req.query, 'query');
    const { frame } = await authorizeFrame(orm.em, userId, frameId, 'read');
    res.json((await compareRevisions(orm.em, workers, frame, from, to, clientGone(res))) satisfies RevisionComparison);
  });

  router.patch('/frames/:frameId/revisions/:version', async (req, res) => {
    const userId = currentUserId(req);
    const { frameId, version } = parseInput(revisionParamsSchema, req.params, 'params');
    const { frame } = await authorizeFrame(orm.em, userId, frameId, 'frame.write');
    const { name } = parseInput(nameRevisionRequestSchema, req.body);
    res.json((await nameRevision(orm.em, frame, version, name)) satisfies RevisionSummary);
  });

  router.post('/frames/:frameId/revisions/:version/restore', async (req, res) => {
    const userId = currentUserId(req);
    const { frameId, version } = parseInput(revisionParamsSchema, req.params, 'params');
    const { frame } = await authorizeFrame(orm.em, userId, frameId, 'frame.write');
    const { baseVersion } = parseInput(restoreRevisionRequestSchema, req.body);
    res.json((await restoreRevision(orm.em, frame, userId, version, baseVersion)) satisfies SaveFrameDocumentResponse);
  });

  router.get('/frames/:frameId/revisions/:version', async (req, res) => {
    const userId = currentUserId(req);
    const { frameId, version } = parseInput(revisionParamsSchema, req.params, 'params');
    const { frame } = await authorizeFrame(orm.em, userId, frameId, 'read');
    res.json((await getRevision(orm.em, frame, version)) satisfies Revision);
  });

  router.delete('/frames/:frameId', async (req, res) => {
    const userId = currentUserId(req);
    const { frameId } = parseInput(frameParamsSchema, req.params, 'params');
    const { frame } = await authorizeFrame(orm.em, userId, frameId, 'frame.write');
    await deleteFrame(orm.em, frame, userId);
    res.status(204).end();
  });

  router.post('/frames/:frameId/restore', async (req, res) => {
    const userId = currentUserId(req);
    const { frameId } = parseInput(frameParamsSchema, req.params, 'params');
    const frame = await authorizeBinnedFrame(orm.em, userId, frameId);
    res.json((await restoreFrame(orm.em, frame)) satisfies FrameSummary);
  });

  return router;
}
