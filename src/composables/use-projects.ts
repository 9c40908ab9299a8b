import type { MaybeRefOrGetter } from 'vue';
import { useApi } from '@/api';
import { useAsyncData } from './use-async-data';

/** The projects of one workshop. */
export function useProjects(workshopId: MaybeRefOrGetter<string>) {
  const api = useApi();
  return useAsyncData(workshopId, (id) => api.projects.list(id));
}

/** One project with its live frames. */
export function useProject(projectId: MaybeRefOrGetter<string>) {
  const api = useApi();
  return useAsyncData(projectId, (id) => api.projects.get(id));
}

/** A project's deleted frames, which can still be restored. */
export function useDeletedFrames(projectId: MaybeRefOrGetter<string>) {
  const api = useApi();
  return useAsyncData(projectId, (id) => api.frames.list(id, { deleted: true }));
}
