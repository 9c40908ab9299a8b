import { z } from 'zod';

// One list of roles and one capability table, read by the server (the authority) and by the client (to hide or
// disable what the signed-in person may not do).
export const ROLES = ['owner', 'designer', 'cutter', 'viewer'] as const;
export const roleSchema = z.enum(ROLES);
export type Role = z.infer<typeof roleSchema>;

export const ROLE_LABELS: Readonly<Record<Role, string>> = {
  owner: 'Owner',
  designer: 'Designer',
  cutter: 'Cutter (shop)',
  viewer: 'Viewer (client)',
};

export const ROLE_DESCRIPTIONS: Readonly<Record<Role, string>> = {
  owner: 'Everything, including the workshop and its members',
  designer: 'Creates and edits projects and frames',
  cutter: 'Reads designs and ticks off cuts in the shop',
  viewer: 'Reads designs only',
};

export const ACTIONS = [
  'workshop.manage',
  'members.manage',
  'project.write',
  'project.delete',
  'frame.write',
  'cuts.tick',
  'read',
] as const;
export type Action = (typeof ACTIONS)[number];

const CAPABILITIES: Readonly<Record<Role, readonly Action[]>> = {
  owner: ACTIONS,
  designer: ['project.write', 'frame.write', 'read'],
  cutter: ['cuts.tick', 'read'],
  viewer: ['read'],
};

/** Whether a member with `role` may perform `action`. No role (not a member) may do nothing. */
export function can(role: Role | null | undefined, action: Action): boolean {
  return role != null && CAPABILITIES[role].includes(action);
}
