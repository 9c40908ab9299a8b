import type { Action, Role } from '@shared/api';

/** What each action lets someone do, worded to follow "does not let you …". */
export const ACTION_WORDS: Readonly<Record<Action, string>> = {
  'workshop.manage': 'change the workshop itself',
  'members.manage': 'manage the workshop’s members',
  'project.write': 'create and edit projects',
  'project.delete': 'delete projects',
  'frame.write': 'create, rename and delete frames',
  'cuts.tick': 'tick off cuts',
  'shop.read': 'see the shop side of a project (saw lists, cutting, files)',
  read: 'see this workshop’s projects',
};

/** Chip colours: owners and designers in the accent family, the shop in graphite, the client in steel blue. */
export const ROLE_COLORS: Readonly<Record<Role, string>> = {
  owner: 'primary',
  designer: 'primary-darken-1',
  cutter: 'secondary',
  viewer: 'info',
  client: 'info',
};
