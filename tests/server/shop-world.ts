import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll } from 'vitest';
import type { Role } from '@shared/api/roles';
import { demoFrameDocument } from '@shared/model/demo-frame';
import type { FrameDocumentJson } from '@shared/api/frames';
import { startFakeSmtp, type FakeSmtp } from '../../server/mail/fake-smtp';
import { ApiClient, signedIn } from '../support/api-client';
import { makeFrame, makeProject, makeUser, makeWorkshop } from '../support/factories';
import { createTestContext, truncateAll, type TestContext } from '../support/test-app';

// A workshop with one member of each role, a project holding the demo frame, and the app mailing through an
// in-process fake SMTP server. Shared by the shop API tests.

export type Actor = Role | 'outsider' | 'anonymous';
export const ACTORS: Actor[] = ['owner', 'designer', 'cutter', 'viewer', 'outsider', 'anonymous'];
/** Roles that may change suppliers, shelf stock and orders; every member may read them. */
export const EDITORS: Actor[] = ['owner', 'designer'];
export const MEMBERS: Actor[] = ['owner', 'designer', 'cutter', 'viewer'];

export interface ShopWorld {
  ctx: TestContext;
  fake: FakeSmtp;
  mailDir: string;
  clients: Map<Actor, ApiClient>;
  userIds: Map<Actor, string>;
  workshopId: string;
  projectId: string;
  frameId: string;
  close(): Promise<void>;
}

export function demoDocument(): FrameDocumentJson {
  return demoFrameDocument() as unknown as FrameDocumentJson;
}

export async function shopWorld(): Promise<ShopWorld> {
  const mailDir = mkdtempSync(join(tmpdir(), 'slotwright-outbox-'));
  const fake = await startFakeSmtp({ port: 0, dir: mailDir });
  const ctx = await createTestContext({ SMTP_PORT: String(fake.port), MAIL_FAKE_DIR: mailDir });
  await truncateAll(ctx.orm);
  const clients = new Map<Actor, ApiClient>();
  const userIds = new Map<Actor, string>();
  const members: { user: Awaited<ReturnType<typeof makeUser>>; role: Role }[] = [];
  for (const a of ACTORS) {
    if (a === 'anonymous') {
      const c = new ApiClient(ctx.app);
      await c.fetchCsrf();
      clients.set(a, c);
      continue;
    }
    const user = await makeUser(ctx.orm, { name: a });
    userIds.set(a, user.id);
    if (a !== 'outsider') members.push({ user, role: a });
    clients.set(a, await signedIn(ctx.app, user));
  }
  const workshop = await makeWorkshop(ctx.orm, members, 'Harbour Lane Van Works');
  const project = await makeProject(ctx.orm, workshop, { name: 'Rear kitchen pod' });
  const frame = await makeFrame(ctx.orm, project, { name: 'Kitchen pod v1', document: demoDocument() });
  return {
    ctx,
    fake,
    mailDir,
    clients,
    userIds,
    workshopId: workshop.id,
    projectId: project.id,
    frameId: frame.id,
    async close() {
      await ctx.close();
      await fake.close();
      rmSync(mailDir, { recursive: true, force: true });
    },
  };
}

/** For a test file: builds the shop world before its tests and closes it after; `ready` receives it. */
export function useShopWorld(ready: (world: ShopWorld) => void): void {
  let world: ShopWorld | undefined;
  beforeAll(async () => {
    world = await shopWorld();
    ready(world);
  }, 120_000);
  afterAll(async () => {
    await world?.close();
  });
}

/** Status a refused caller gets: 401 anonymous, 404 outside the workshop, 403 a member without the capability. */
export const refusal = (a: Actor): number => (a === 'anonymous' ? 401 : a === 'outsider' ? 404 : 403);
