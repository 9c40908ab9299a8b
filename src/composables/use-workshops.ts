import type { MaybeRefOrGetter } from 'vue';
import { useApi } from '@/api';
import { useAsyncData } from './use-async-data';

/** The workshops the signed-in person belongs to, with their role and head count. */
export function useWorkshops() {
  const api = useApi();
  return useAsyncData(null, () => api.workshops.list());
}

/** The members of one workshop. */
export function useMembers(workshopId: MaybeRefOrGetter<string>) {
  const api = useApi();
  return useAsyncData(workshopId, (id) => api.members.list(id));
}
