import { z } from 'zod';
import { memberSchema, type AddMemberRequest, type Member, type UpdateMemberRequest } from '@shared/api';
import type { Http } from './http';

const memberListSchema = z.array(memberSchema);

const membersPath = (workshopId: string) => `/workshops/${encodeURIComponent(workshopId)}/members`;
const memberPath = (workshopId: string, userId: string) => `${membersPath(workshopId)}/${encodeURIComponent(userId)}`;

export function createMembersApi(http: Http) {
  return {
    list: (workshopId: string): Promise<Member[]> => http.get(membersPath(workshopId), memberListSchema),
    add: (workshopId: string, body: AddMemberRequest): Promise<Member> => http.post(membersPath(workshopId), body, memberSchema),
    changeRole: (workshopId: string, userId: string, body: UpdateMemberRequest): Promise<Member> =>
      http.patch(memberPath(workshopId, userId), body, memberSchema),
    remove: (workshopId: string, userId: string): Promise<void> => http.delete(memberPath(workshopId, userId), null),
  };
}
