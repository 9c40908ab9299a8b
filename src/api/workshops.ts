import { z } from 'zod';
import {
  workshopSummarySchema,
  type CreateWorkshopRequest,
  type RenameWorkshopRequest,
  type WorkshopSummary,
} from '@shared/api';
import type { Http } from './http';

const workshopListSchema = z.array(workshopSummarySchema);

export function createWorkshopsApi(http: Http) {
  return {
    list: (): Promise<WorkshopSummary[]> => http.get('/workshops', workshopListSchema),
    create: (body: CreateWorkshopRequest): Promise<WorkshopSummary> => http.post('/workshops', body, workshopSummarySchema),
    rename: (workshopId: string, body: RenameWorkshopRequest): Promise<WorkshopSummary> =>
      http.patch(`/workshops/${encodeURIComponent(workshopId)}`, body, workshopSummarySchema),
  };
}
