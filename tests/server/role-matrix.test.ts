import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import type { z } from 'zod';
import {
  frameSchema,
  frameSummarySchema,
  revisionComparisonSchema,
  revisionSchema,
  revisionSummarySchema,
  saveFrameDocumentResponseSchema,
} from '@shared/api/frames';
import { projectDetailSchema, projectSummarySchema } from '@shared/api/projects';
import { memberSchema, workshopSummarySchema } from '@shared/api/workshops';
import type { Role } from '@shared/api/roles';
import { binEntrySchema } from '@shared/api/bin';
import { projectFileSchema } from '@shared/api/project-file';
import { FrameRevision } from '../../server/modules/frames/frame-revision.entity';
import { Frame } from '../../server/modules/frames/frame.entity';
import { Project } from '../../server/modules/projects/project.entity';
import { Membership } from '../../server/modules/workshops/membership.entity';
import { Workshop } from '../../server/modules/workshops/workshop.entity';
import { ApiClient, signedIn } from '../support/api-client';
import { makeFrame, makeProject, makeUser, makeWorkshop, sampleDocument } from '../support/factories';
import { createTestContext, truncateAll, type TestContext } from '../support/test-app';

// Every route, called by every kind of caller. Members whose role lacks the capability get 403, people outside
// the workshop get 404 (its contents are not theirs to know about), anonymous callers get 401; a refused call
// changes nothing.

type Actor = Role | 'outsider' | 'anonymous';
const ACTORS: Actor[] = ['owner', 'designer', 'cutter', 'viewer', 'outsider', 'anonymous'];
const MEMBERS: Actor[] = ['owner', 'designer', 'cutter', 'viewer'];
const EDITORS: Actor[] = ['owner', 'designer'];

interface World {
  workshopId: string;
  projectId: string;
  frameId: string;
  extraUserId: string;
  newcomerEmail: string;
}

interface RouteCase {
  method: 'get' | 'post' | 'put' | 'patch' | 'delete';
  path: (w: World) => string;
  body?: (w: World) => unknown;
  allowed: Actor[];
  status: number;
  schema?: z.ZodType;
  /** Whether people outside the workshop can reach it at all (workshop-independent routes). */
  open?: boolean;
  prepare?: (w: World) => Promise<void>;
}

let ctx: TestContext;
const clients = new Map<Actor, ApiClient>();
const users = new Map<Actor, { id: string }>();

const ROUTES: Record<string, RouteCase> = {
  'GET /workshops': { method: 'get', path: () => '/api/workshops', allowed: [...MEMBERS, 'outsider'], status: 200, open: true },
  'POST /workshops': {
    method: 'post',
    path: () => '/api/workshops',
    body: () => ({ name: 'Second bay' }),
    allowed: [...MEMBERS, 'outsider'],
    status: 201,
    schema: workshopSummarySchema,
    open: true,
  },
  'PATCH /workshops/:id': {
    method: 'patch',
    path: (w) => `/api/workshops/${w.workshopId}`,
    body: () => ({ name: 'Renamed workshop' }),
    allowed: ['owner'],
    status: 200,
    schema: workshopSummarySchema,
  },
  'GET /workshops/:id/members': { method: 'get', path: (w) => `/api/workshops/${w.workshopId}/members`, allowed: MEMBERS, status: 200 },
  'POST /workshops/:id/members': {
    method: 'post',
    path: (w) => `/api/workshops/${w.workshopId}/members`,
    body: (w) => ({ email: w.newcomerEmail, role: 'viewer' }),
    allowed: ['owner'],
    status: 201,
    schema: memberSchema,
  },
  'PATCH /workshops/:id/members/:userId': {
    method: 'patch',
    path: (w) => `/api/workshops/${w.workshopId}/members/${w.extraUserId}`,
    body: () => ({ role: 'cutter' }),
    allowed: ['owner'],
    status: 200,
    schema: memberSchema,
  },
  'DELETE /workshops/:id/members/:userId': {
    method: 'delete',
    path: (w) => `/api/workshops/${w.workshopId}/members/${w.extraUserId}`,
    allowed: ['owner'],
    status: 204,
  },
  'GET /workshops/:id/projects': { method: 'get', path: (w) => `/api/workshops/${w.workshopId}/projects`, allowed: MEMBERS, status: 200 },
  'POST /workshops/:id/projects': {
    method: 'post',
    path: (w) => `/api/workshops/${w.workshopId}/projects`,
    body: () => ({ name: 'Bed frame, long-wheelbase van', client: 'A. Client' }),
    allowed: EDITORS,
    status: 201,
    schema: projectSummarySchema,
  },
  'GET /projects/:id': { method: 'get', path: (w) => `/api/projects/${w.projectId}`, allowed: MEMBERS, status: 200, schema: projectDetailSchema },
  'PATCH /projects/:id': {
    method: 'patch',
    path: (w) => `/api/projects/${w.projectId}`,
    body: () => ({ name: 'Renamed project', notes: 'new notes' }),
    allowed: EDITORS,
    status: 200,
    schema: projectSummarySchema,
  },
  'DELETE /projects/:id': { method: 'delete', path: (w) => `/api/projects/${w.projectId}`, allowed: ['owner'], status: 204 },
  'GET /projects/:id/frames': { method: 'get', path: (w) => `/api/projects/${w.projectId}/frames`, allowed: MEMBERS, status: 200 },
  'POST /projects/:id/frames': {
    method: 'post',
    path: (w) => `/api/projects/${w.projectId}/frames`,
    body: () => ({ name: 'Drawer stack carcass' }),
    allowed: EDITORS,
    status: 201,
    schema: frameSchema,
  },
  'GET /frames/:id': { method: 'get', path: (w) => `/api/frames/${w.frameId}`, allowed: MEMBERS, status: 200, schema: frameSchema },
  'PATCH /frames/:id': {
    method: 'patch',
    path: (w) => `/api/frames/${w.frameId}`,
    body: () => ({ name: 'Renamed frame' }),
    allowed: EDITORS,
    status: 200,
    schema: frameSummarySchema,
  },
  'PUT /frames/:id/document': {
    method: 'put',
    path: (w) => `/api/frames/${w.frameId}/document`,
    body: () => ({ baseVersion: 1, document: sampleDocument(3, 'new') }),
    allowed: EDITORS,
    status: 200,
    schema: saveFrameDocumentResponseSchema,
  },
  'GET /frames/:id/revisions': { method: 'get', path: (w) => `/api/frames/${w.frameId}/revisions`, allowed: MEMBERS, status: 200 },
  'GET /frames/:id/revisions/:version': {
    method: 'get',
    path: (w) => `/api/frames/${w.frameId}/revisions/1`,
    allowed: MEMBERS,
    status: 200,
    schema: revisionSchema,
  },
  'POST /frames/:id/revisions': {
    method: 'post',
    path: (w) => `/api/frames/${w.frameId}/revisions`,
    body: () => ({ baseVersion: 1, name: 'sent to client' }),
    allowed: EDITORS,
    status: 200,
    schema: revisionSummarySchema,
  },
  'GET /frames/:id/revisions/compare': {
    method: 'get',
    path: (w) => `/api/frames/${w.frameId}/revisions/compare?from=1&to=1`,
    allowed: MEMBERS,
    status: 200,
    schema: revisionComparisonSchema,
  },
  'PATCH /frames/:id/revisions/:version': {
    method: 'patch',
    path: (w) => `/api/frames/${w.frameId}/revisions/1`,
    body: () => ({ name: 'as cut' }),
    allowed: EDITORS,
    status: 200,
    schema: revisionSummarySchema,
  },
  'POST /frames/:id/revisions/:version/restore': {
    method: 'post',
    path: (w) => `/api/frames/${w.frameId}/revisions/1/restore`,
    body: () => ({ baseVersion: 2 }),
    allowed: EDITORS,
    status: 200,
    schema: saveFrameDocumentResponseSchema,
    prepare: async (w) => {
      // Version 2 is stored and version 1 kept, so there is an earlier revision to go back to.
      const em = ctx.orm.em.fork();
      const frame = await em.findOneOrFail(Frame, { id: w.frameId });
      em.create(FrameRevision, { frame, version: 1, document: frame.document, memberCount: frame.memberCount, savedAt: frame.savedAt, savedBy: null, name: null });
      frame.version = 2;
      frame.document = sampleDocument(3, 'two');
      frame.memberCount = 3;
      await em.flush();
    },
  },
  'DELETE /frames/:id': { method: 'delete', path: (w) => `/api/frames/${w.frameId}`, allowed: EDITORS, status: 204 },
  'POST /frames/:id/restore': {
    method: 'post',
    path: (w) => `/api/frames/${w.frameId}/restore`,
    allowed: EDITORS,
    status: 200,
    schema: frameSummarySchema,
    prepare: async (w) => {
      const em = ctx.orm.em.fork();
      await em.nativeUpdate(Frame, { id: w.frameId }, { deletedAt: new Date() });
    },
  },
  'GET /projects/:id/export': { method: 'get', path: (w) => `/api/projects/${w.projectId}/export`, allowed: EDITORS, status: 200, schema: projectFileSchema },
  'GET /workshops/:id/bin': { method: 'get', path: (w) => `/api/workshops/${w.workshopId}/bin`, allowed: EDITORS, status: 200, schema: binEntrySchema.array() },
  'POST /projects/:id/restore': {
    method: 'post',
    path: (w) => `/api/projects/${w.projectId}/restore`,
    allowed: EDITORS,
    status: 200,
    schema: projectSummarySchema,
    prepare: async (w) => {
      const em = ctx.orm.em.fork();
      await em.nativeUpdate(Project, { id: w.projectId }, { deletedAt: new Date() });
    },
  },
};

const LIST_SCHEMAS: Record<string, z.ZodType> = {
  'GET /workshops': workshopSummarySchema.array(),
  'GET /workshops/:id/members': memberSchema.array(),
  'GET /workshops/:id/projects': projectSummarySchema.array(),
  'GET /projects/:id/frames': frameSummarySchema.array(),
  'GET /frames/:id/revisions': revisionSummarySchema.array(),
};

async function buildWorld(): Promise<World> {
  const extra = await makeUser(ctx.orm);
  const newcomer = await makeUser(ctx.orm);
  const workshop = await makeWorkshop(ctx.orm, [
    ...(['owner', 'designer', 'cutter', 'viewer'] as Role[]).map((role) => ({ user: users.get(role) as never, role })),
    { user: extra, role: 'designer' },
  ]);
  const project = await makeProject(ctx.orm, workshop);
  const frame = await makeFrame(ctx.orm, project, { savedBy: extra });
  return { workshopId: workshop.id, projectId: project.id, frameId: frame.id, extraUserId: extra.id, newcomerEmail: newcomer.email };
}

/** Everything a refused call might have touched, read fresh from the database. */
async function fingerprint(w: World): Promise<unknown> {
  const em = ctx.orm.em.fork();
  const workshop = await em.findOneOrFail(Workshop, { id: w.workshopId });
  const members = await em.find(Membership, { workshop: w.workshopId }, { orderBy: { user: 'asc' } });
  const projects = await em.find(Project, { workshop: w.workshopId }, { orderBy: { id: 'asc' } });
  const frames = await em.find(Frame, { project: { workshop: w.workshopId } }, { orderBy: { id: 'asc' } });
  const ownWorkshops = await em.count(Membership, {});
  const revisions = await em.find(FrameRevision, { frame: { project: { workshop: w.workshopId } } }, { exclude: ['document'], orderBy: { version: 'asc' } });
  return {
    workshop: workshop.name,
    members: members.map((m) => [m.user.id, m.role]),
    projects: projects.map((p) => [p.id, p.name, p.notes, p.deletedAt]),
    frames: frames.map((f) => [f.id, f.name, f.version, f.document, f.deletedAt, f.headName, f.headKept]),
    revisions: revisions.map((r) => [r.version, r.name]),
    ownWorkshops,
  };
}

beforeAll(async () => {
  ctx = await createTestContext();
  await truncateAll(ctx.orm);
  for (const actor of ACTORS) {
    if (actor === 'anonymous') {
      const anon = new ApiClient(ctx.app);
      await anon.fetchCsrf();
      clients.set(actor, anon);
      continue;
    }
    const user = await makeUser(ctx.orm, { name: `The ${actor}` });
    users.set(actor, user);
    clients.set(actor, await signedIn(ctx.app, user));
  }
});
afterAll(() => ctx.close());
afterEach(() => {
  expect(ctx.loggedErrors).toEqual([]);
});

describe.each(Object.entries(ROUTES))('%s', (name, route) => {
  it.each(ACTORS)('as %s', async (actor) => {
    const world = await buildWorld();
    await route.prepare?.(world);
    const before = await fingerprint(world);
    const client = clients.get(actor)!;
    const res = await client.send(route.method, route.path(world), route.body?.(world));

    if (route.allowed.includes(actor)) {
      expect(res.status, JSON.stringify(res.body)).toBe(route.status);
      const schema = route.schema ?? LIST_SCHEMAS[name];
      if (schema) schema.parse(res.body);
      if (route.status === 204) expect(res.body).toEqual({});
      return;
    }

    const expected = actor === 'anonymous' ? [401, 'unauthenticated'] : MEMBERS.includes(actor) || route.open ? [403, 'forbidden'] : [404, 'not_found'];
    expect(res.status, JSON.stringify(res.body)).toBe(expected[0]);
    expect(res.body.error.code).toBe(expected[1]);
    expect(await fingerprint(world)).toEqual(before);
  });
});
