import { z } from 'zod';
import {
  acceptInvitationResponseSchema,
  createdShareLinkSchema,
  invitationPreviewSchema,
  invitationSchema,
  projectClientSchema,
  sharedProjectSchema,
  shareLinkSchema,
  type AcceptInvitationRequest,
  type AcceptInvitationResponse,
  type CreatedShareLink,
  type Invitation,
  type InvitationPreview,
  type InviteRequest,
  type ProjectClient,
  type SharedProject,
  type ShareLink,
} from '@shared/api';
import { activityEntrySchema, type ActivityEntry } from '@shared/api';
import type { Http } from './http';

const enc = encodeURIComponent;

export function createInvitationsApi(http: Http) {
  return {
    list: (workshopId: string): Promise<Invitation[]> => http.get(`/workshops/${enc(workshopId)}/invitations`, z.array(invitationSchema)),
    invite: (workshopId: string, body: InviteRequest): Promise<Invitation> => http.post(`/workshops/${enc(workshopId)}/invitations`, body, invitationSchema),
    revoke: (id: string): Promise<void> => http.delete(`/invitations/${enc(id)}`, null),
    preview: (token: string): Promise<InvitationPreview> => http.get(`/invitations/${enc(token)}`, invitationPreviewSchema),
    accept: (token: string, body: AcceptInvitationRequest): Promise<AcceptInvitationResponse> =>
      http.post(`/invitations/${enc(token)}/accept`, body, acceptInvitationResponseSchema),
  };
}

export function createSharingApi(http: Http) {
  return {
    clients: (projectId: string): Promise<ProjectClient[]> => http.get(`/projects/${enc(projectId)}/clients`, z.array(projectClientSchema)),
    removeClient: (projectId: string, userId: string): Promise<void> => http.delete(`/projects/${enc(projectId)}/clients/${enc(userId)}`, null),
    links: (projectId: string): Promise<ShareLink[]> => http.get(`/projects/${enc(projectId)}/share-links`, z.array(shareLinkSchema)),
    createLink: (projectId: string, days: number): Promise<CreatedShareLink> => http.post(`/projects/${enc(projectId)}/share-links`, { days }, createdShareLinkSchema),
    revokeLink: (id: string): Promise<void> => http.delete(`/share-links/${enc(id)}`, null),
    shared: (token: string): Promise<SharedProject> => http.get(`/shared/${enc(token)}`, sharedProjectSchema),
  };
}

export function createActivityApi(http: Http) {
  return {
    list: (projectId: string): Promise<ActivityEntry[]> => http.get(`/projects/${enc(projectId)}/activity`, z.array(activityEntrySchema)),
  };
}
