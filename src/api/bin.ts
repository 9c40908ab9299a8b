import { z } from 'zod';
import { binEntrySchema, projectSummarySchema, type BinEntry, type ProjectSummary } from '@shared/api';
import type { Http } from './http';

const binListSchema = z.array(binEntrySchema);

export function createBinApi(http: Http) {
  return {
    list: (workshopId: string): Promise<BinEntry[]> => http.get(`/workshops/${encodeURIComponent(workshopId)}/bin`, binListSchema),
    /** Frames are restored with frames.restore. */
    restoreProject: (projectId: string): Promise<ProjectSummary> =>
      http.post(`/projects/${encodeURIComponent(projectId)}/restore`, undefined, projectSummarySchema),
  };
}
