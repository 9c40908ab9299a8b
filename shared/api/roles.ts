import { z } from 'zod';

// One list of roles and one capability table, read by the server (the authority) and by the client (to hide or
// disable what the signed-in person may not do).
// Members belong to the whole workshop; a client is let into single projects only and is never a member.
export const WORKSHOP_ROLES = ['owner', 'designer', 'cutter', 'viewer'] as const;
export const workshopRoleSchema = z.enum(WORKSHOP_ROLES);
export type WorkshopRole = z.infer<typeof workshopRoleSchema>;
export const ROLES = [...WORKSHOP_ROLES, 'client'] as const;
export const roleSchema = z.enum(ROLES);
export type Role = z.infer<typeof roleSchema>;

export const ROLE_LABELS: Readonly<Record<Role, string>> = {
  owner: 'Owner',
  designer: 'Designer',
  cutter: 'Cutter (shop)',
  viewer: 'Viewer',
  client: 'Client',
};

export const ROLE_DESCRIPTIONS: Readonly<Record<Role, string>> = {
  owner: 'Everything, including the workshop and its members',
  designer: 'Creates and edits projects and frames',
  cutter: 'Reads designs and ticks off cuts in the shop',
  viewer: "Reads the workshop's designs, stock and orders",
  client: 'Sees only the projects they are invited to: drawings, sizes, mass and shared files',
};

export const ACTIONS = [
  'workshop.manage',
  'members.manage',
  'project.write',
  'project.delete',
  'frame.write',
  'cuts.tick',
  /** The shop side of a project: saw, drill and pick lists, labels, cutting, every file. */
  'shop.read',
  'read',
] as const;
export type Action = (typeof ACTIONS)[number];

const CAPABILITIES: Readonly<Record<Role, readonly Action[]>> = {
  owner: ACTIONS,
  designer: ['project.write', 'frame.write', 'shop.read', 'read'],
  cutter: ['cuts.tick', 'shop.read', 'read'],
  viewer: ['shop.read', 'read'],
  client: ['read'],
};

/** Whether a member with `role` may perform `action`. No role (not a member) may do nothing. */
export function can(role: Role | null | undefined, action: Action): boolean {
  return role != null && CAPABILITIES[role].includes(action);
}
