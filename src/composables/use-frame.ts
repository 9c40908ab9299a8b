import type { MaybeRefOrGetter } from 'vue';
import { useApi } from '@/api';
import { useAsyncData } from './use-async-data';

/** One frame with its document. */
export function useFrame(frameId: MaybeRefOrGetter<string>) {
  const api = useApi();
  return useAsyncData(frameId, (id) => api.frames.get(id));
}

/** A frame's saved versions, newest first. */
export function useFrameRevisions(frameId: MaybeRefOrGetter<string>) {
  const api = useApi();
  return useAsyncData(frameId, (id) => api.frames.revisions(id));
}
