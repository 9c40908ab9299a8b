import type { RouteRecordInfo, RouteRecordRaw } from 'vue-router';
import type { Action } from '@shared/api';
import SignInView from '@/views/SignInView.vue';

type NoParams = Record<never, never>;
type WorkshopParams = { workshopId: string };
type ProjectParams = WorkshopParams & { projectId: string };
type FrameParams = ProjectParams & { frameId: string };

/** Every route by name, with its params: the closed set `router.push({ name })` and `useRoute(name)` accept. */
export interface RouteNamedMap {
  'sign-in': RouteRecordInfo<'sign-in', '/sign-in', NoParams, NoParams>;
  home: RouteRecordInfo<'home', '/', NoParams, NoParams>;
  workshops: RouteRecordInfo<'workshops', '/workshops', NoParams, NoParams>;
  projects: RouteRecordInfo<'projects', '/w/:workshopId', WorkshopParams, WorkshopParams>;
  members: RouteRecordInfo<'members', '/w/:workshopId/members', WorkshopParams, WorkshopParams>;
  'workshop-settings': RouteRecordInfo<'workshop-settings', '/w/:workshopId/settings', WorkshopParams, WorkshopParams>;
  project: RouteRecordInfo<'project', '/w/:workshopId/projects/:projectId', ProjectParams, ProjectParams>;
  frame: RouteRecordInfo<'frame', '/w/:workshopId/projects/:projectId/frames/:frameId', FrameParams, FrameParams>;
  cutting: RouteRecordInfo<'cutting', '/w/:workshopId/projects/:projectId/frames/:frameId/cutting', FrameParams, FrameParams>;
  suppliers: RouteRecordInfo<'suppliers', '/w/:workshopId/suppliers', WorkshopParams, WorkshopParams>;
  orders: RouteRecordInfo<'orders', '/w/:workshopId/orders', WorkshopParams, WorkshopParams>;
  outbox: RouteRecordInfo<'outbox', '/w/:workshopId/outbox', WorkshopParams, WorkshopParams>;
  bin: RouteRecordInfo<'bin', '/w/:workshopId/bin', WorkshopParams, WorkshopParams>;
  planner: RouteRecordInfo<'planner', '/planner', NoParams, NoParams>;
  invitation: RouteRecordInfo<'invitation', '/invitation/:token', { token: string }, { token: string }>;
  'forgot-password': RouteRecordInfo<'forgot-password', '/forgot-password', NoParams, NoParams>;
  'reset-password': RouteRecordInfo<'reset-password', '/reset-password/:token', { token: string }, { token: string }>;
  shared: RouteRecordInfo<'shared', '/shared/:token', { token: string }, { token: string }>;
  forbidden: RouteRecordInfo<'forbidden', '/forbidden', NoParams, NoParams>;
  'not-found': RouteRecordInfo<'not-found', '/:pathMatch(.*)*', { pathMatch: string | string[] }, { pathMatch: string[] }>;
}
export type RouteName = keyof RouteNamedMap;

declare module 'vue-router' {
  interface TypesConfig {
    RouteNamedMap: RouteNamedMap;
  }
  interface RouteMeta {
    /** Open without signing in. */
    public?: boolean;
    /** What the member's role in the route's workshop must allow (see `can` in shared/api/roles.ts). */
    requires?: Action;
    /** Page title after "Slotwright · ". */
    title?: string;
  }
}

export const routes: RouteRecordRaw[] = [
  { path: '/sign-in', name: 'sign-in', component: SignInView, meta: { public: true, title: 'Sign in' } },
  // The guard sends home to the chosen workshop's projects.
  { path: '/', name: 'home', component: () => import('@/views/WorkshopsView.vue') },
  {
    path: '/workshops',
    name: 'workshops',
    component: () => import('@/views/WorkshopsView.vue'),
    meta: { title: 'Workshops' },
  },
  {
    path: '/w/:workshopId',
    name: 'projects',
    component: () => import('@/views/ProjectsView.vue'),
    meta: { requires: 'read', title: 'Projects' },
  },
  {
    path: '/w/:workshopId/members',
    name: 'members',
    component: () => import('@/views/MembersView.vue'),
    meta: { requires: 'members.manage', title: 'Members' },
  },
  {
    path: '/w/:workshopId/settings',
    name: 'workshop-settings',
    component: () => import('@/views/WorkshopSettingsView.vue'),
    meta: { requires: 'read', title: 'Workshop settings' },
  },
  {
    path: '/w/:workshopId/projects/:projectId',
    name: 'project',
    component: () => import('@/views/ProjectView.vue'),
    meta: { requires: 'read', title: 'Project' },
  },
  {
    path: '/w/:workshopId/projects/:projectId/frames/:frameId',
    name: 'frame',
    component: () => import('@/views/FrameView.vue'),
    meta: { requires: 'read', title: 'Frame' },
  },
  // Shop outputs and ordering.
  { path: '/w/:workshopId/projects/:projectId/frames/:frameId/cutting', name: 'cutting', component: () => import('@/views/CuttingView.vue'), meta: { requires: 'shop.read', title: 'Cutting' } },
  // Links from e-mails and share links: open without signing in.
  { path: '/invitation/:token', name: 'invitation', component: () => import('@/views/InvitationView.vue'), meta: { public: true, title: 'Invitation' } },
  { path: '/forgot-password', name: 'forgot-password', component: () => import('@/views/ForgotPasswordView.vue'), meta: { public: true, title: 'Forgotten password' } },
  { path: '/reset-password/:token', name: 'reset-password', component: () => import('@/views/ResetPasswordView.vue'), meta: { public: true, title: 'New password' } },
  { path: '/shared/:token', name: 'shared', component: () => import('@/views/SharedProjectView.vue'), meta: { public: true, title: 'Shared project' } },
  { path: '/w/:workshopId/suppliers', name: 'suppliers', component: () => import('@/views/SuppliersView.vue'), meta: { requires: 'read', title: 'Suppliers and stock' } },
  { path: '/w/:workshopId/orders', name: 'orders', component: () => import('@/views/OrdersView.vue'), meta: { requires: 'read', title: 'Orders' } },
  { path: '/planner', name: 'planner', component: () => import('@/views/QuickPlannerView.vue'), meta: { title: 'Quick planner' } },
  { path: '/w/:workshopId/bin', name: 'bin', component: () => import('@/views/BinView.vue'), meta: { requires: 'project.write', title: 'Bin' } },
  { path: '/w/:workshopId/outbox', name: 'outbox', component: () => import('@/views/OutboxView.vue'), meta: { requires: 'workshop.manage', title: 'Outbox' } },
  {
    path: '/forbidden',
    name: 'forbidden',
    component: () => import('@/views/ForbiddenView.vue'),
    meta: { title: 'Not allowed' },
  },
  {
    path: '/:pathMatch(.*)*',
    name: 'not-found',
    component: () => import('@/views/NotFoundView.vue'),
    meta: { public: true, title: 'Not found' },
  },
];
