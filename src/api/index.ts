import { inject, type InjectionKey } from 'vue';
import { createAuthApi } from './auth';
import { createBinApi } from './bin';
import { createFramesApi } from './frames';
import type { Http } from './http';
import { createMembersApi } from './members';
import { createActivityApi, createInvitationsApi, createSharingApi } from './invitations';
import { createProjectsApi } from './projects';
import { createWorkshopsApi } from './workshops';

export function createApi(http: Http) {
  return {
    auth: createAuthApi(http),
    workshops: createWorkshopsApi(http),
    members: createMembersApi(http),
    projects: createProjectsApi(http),
    frames: createFramesApi(http),
    invitations: createInvitationsApi(http),
    sharing: createSharingApi(http),
    activity: createActivityApi(http),
    bin: createBinApi(http),
  };
}
export type Api = ReturnType<typeof createApi>;

export const apiKey: InjectionKey<Api> = Symbol('api');

/** The app's API client, provided once in main.ts. Works in components, setup stores and router guards. */
export function useApi(): Api {
  const api = inject(apiKey);
  if (!api) throw new Error('The API client is not provided: main.ts must call app.provide(apiKey, …)');
  return api;
}

export { ApiError, errorMessage, isApiError } from './http';
