import { z } from 'zod';
import {
  frameSchema,
  frameSummarySchema,
  revisionComparisonSchema,
  revisionSchema,
  revisionSummarySchema,
  saveFrameDocumentResponseSchema,
  type CreateFrameRequest,
  type Frame,
  type FrameSummary,
  type KeepRevisionRequest,
  type NameRevisionRequest,
  type RestoreRevisionRequest,
  type RevisionComparison,
  type RenameFrameRequest,
  type Revision,
  type RevisionSummary,
  type SaveFrameDocumentRequest,
  type SaveFrameDocumentResponse,
} from '@shared/api';
import type { Http } from './http';

const frameListSchema = z.array(frameSummarySchema);
const revisionListSchema = z.array(revisionSummarySchema);

const framePath = (frameId: string) => `/frames/${encodeURIComponent(frameId)}`;
const projectFramesPath = (projectId: string) => `/projects/${encodeURIComponent(projectId)}/frames`;

export function createFramesApi(http: Http) {
  return {
    /** Live frames, or with `deleted` the recoverable ones only. */
    list: (projectId: string, { deleted = false }: { deleted?: boolean } = {}): Promise<FrameSummary[]> =>
      http.get(projectFramesPath(projectId), frameListSchema, deleted ? { deleted: 'true' } : undefined),
    create: (projectId: string, body: CreateFrameRequest): Promise<Frame> =>
      http.post(projectFramesPath(projectId), body, frameSchema),
    get: (frameId: string): Promise<Frame> => http.get(framePath(frameId), frameSchema),
    rename: (frameId: string, body: RenameFrameRequest): Promise<FrameSummary> =>
      http.patch(framePath(frameId), body, frameSummarySchema),
    // Reply bodies of delete/restore are not needed: callers reload the lists.
    remove: (frameId: string): Promise<void> => http.delete(framePath(frameId), null),
    restore: (frameId: string): Promise<void> => http.post(`${framePath(frameId)}/restore`, undefined, null),
    saveDocument: (frameId: string, body: SaveFrameDocumentRequest): Promise<SaveFrameDocumentResponse> =>
      http.put(`${framePath(frameId)}/document`, body, saveFrameDocumentResponseSchema),
    revisions: (frameId: string): Promise<RevisionSummary[]> => http.get(`${framePath(frameId)}/revisions`, revisionListSchema),
    revision: (frameId: string, version: number): Promise<Revision> =>
      http.get(`${framePath(frameId)}/revisions/${version}`, revisionSchema),
    /** "Save revision": the current version stays in the history when the next save replaces it. */
    keepRevision: (frameId: string, body: KeepRevisionRequest): Promise<RevisionSummary> =>
      http.post(`${framePath(frameId)}/revisions`, body, revisionSummarySchema),
    nameRevision: (frameId: string, version: number, body: NameRevisionRequest): Promise<RevisionSummary> =>
      http.patch(`${framePath(frameId)}/revisions/${version}`, body, revisionSummarySchema),
    compareRevisions: (frameId: string, from: number, to: number): Promise<RevisionComparison> =>
      http.get(`${framePath(frameId)}/revisions/compare`, revisionComparisonSchema, { from: String(from), to: String(to) }),
    restoreRevision: (frameId: string, version: number, body: RestoreRevisionRequest): Promise<SaveFrameDocumentResponse> =>
      http.post(`${framePath(frameId)}/revisions/${version}/restore`, body, saveFrameDocumentResponseSchema),
  };
}
