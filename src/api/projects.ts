import { z } from 'zod';
import {
  projectDetailSchema,
  projectSummarySchema,
  type CreateProjectRequest,
  type ProjectDetail,
  type ProjectSummary,
  type UpdateProjectRequest,
} from '@shared/api';
import type { Http } from './http';

const projectListSchema = z.array(projectSummarySchema);

const projectPath = (projectId: string) => `/projects/${encodeURIComponent(projectId)}`;
const workshopProjectsPath = (workshopId: string) => `/workshops/${encodeURIComponent(workshopId)}/projects`;

export function createProjectsApi(http: Http) {
  return {
    list: (workshopId: string): Promise<ProjectSummary[]> => http.get(workshopProjectsPath(workshopId), projectListSchema),
    create: (workshopId: string, body: CreateProjectRequest): Promise<ProjectSummary> =>
      http.post(workshopProjectsPath(workshopId), body, projectSummarySchema),
    get: (projectId: string): Promise<ProjectDetail> => http.get(projectPath(projectId), projectDetailSchema),
    update: (projectId: string, body: UpdateProjectRequest): Promise<ProjectSummary> =>
      http.patch(projectPath(projectId), body, projectSummarySchema),
    remove: (projectId: string): Promise<void> => http.delete(projectPath(projectId), null),
  };
}
