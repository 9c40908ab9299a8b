import { z } from 'zod';
import {
  workshopSummarySchema,
  type CreateWorkshopRequest,
  type RenameWorkshopRequest,
  type WorkshopSummary,
} from '@shared/api';
import { workshopSettingsSchema, type WorkshopSettingsInput, type WorkshopSettingsView } from '@shared/api/workshop-settings';
import type { Http } from './http';

const settingsViewSchema = z.object({ settings: workshopSettingsSchema, canEdit: z.boolean() });
const settingsPath = (workshopId: string) => `/workshops/${encodeURIComponent(workshopId)}/settings`;

const workshopListSchema = z.array(workshopSummarySchema);

export function createWorkshopsApi(http: Http) {
  return {
    list: (): Promise<WorkshopSummary[]> => http.get('/workshops', workshopListSchema),
    create: (body: CreateWorkshopRequest): Promise<WorkshopSummary> => http.post('/workshops', body, workshopSummarySchema),
    rename: (workshopId: string, body: RenameWorkshopRequest): Promise<WorkshopSummary> =>
      http.patch(`/workshops/${encodeURIComponent(workshopId)}`, body, workshopSummarySchema),
    settings: (workshopId: string): Promise<WorkshopSettingsView> => http.get(settingsPath(workshopId), settingsViewSchema),
    saveSettings: (workshopId: string, body: WorkshopSettingsInput): Promise<WorkshopSettingsView> => http.put(settingsPath(workshopId), body, settingsViewSchema),
  };
}
