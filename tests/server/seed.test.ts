import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { meResponseSchema } from '@shared/api/auth';
import { projectDetailSchema } from '@shared/api/projects';
import { DEMO_FRAME, DEMO_PASSWORD, DEMO_PROJECT, DEMO_USERS, DEMO_WORKSHOP, seedDemoData } from '../../scripts/seed';
import { Frame } from '../../server/modules/frames/frame.entity';
import { User } from '../../server/modules/users/user.entity';
import { Workshop } from '../../server/modules/workshops/workshop.entity';
import { signedIn } from '../support/api-client';
import { createTestContext, truncateAll, type TestContext } from '../support/test-app';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
  await truncateAll(ctx.orm);
});
afterAll(() => ctx.close());

describe('demo seed', () => {
  it('creates the demo workshop once; a second run changes nothing', async () => {
    expect(await seedDemoData(ctx.orm)).toBe(true);
    expect(await seedDemoData(ctx.orm)).toBe(false);
    const em = ctx.orm.em.fork();
    expect(await em.count(Workshop, { name: DEMO_WORKSHOP })).toBe(1);
    expect(await em.count(User, {})).toBe(DEMO_USERS.length);
    expect(await em.count(Frame, {})).toBe(1);
  });

  it('each demo account signs in with the demo password and has its role', async () => {
    for (const demo of DEMO_USERS) {
      const client = await signedIn(ctx.app, { email: demo.email, password: DEMO_PASSWORD });
      const me = meResponseSchema.parse((await client.get('/api/auth/me').expect(200)).body);
      if (demo.role === 'client') {
        // The demo client is let into the demo project only, and is no member of the workshop.
        expect(me.memberships).toEqual([]);
        expect(me.clientProjects).toEqual([{ project: { id: expect.any(String), name: DEMO_PROJECT }, workshop: { id: expect.any(String), name: DEMO_WORKSHOP } }]);
        continue;
      }
      expect(me.memberships).toEqual([{ workshop: { id: expect.any(String), name: DEMO_WORKSHOP }, role: demo.role }]);
      if (demo.role !== 'designer') continue;
      const projects = (await client.get(`/api/workshops/${me.memberships[0].workshop.id}/projects`).expect(200)).body as { id: string; name: string }[];
      expect(projects.map((p) => p.name)).toEqual([DEMO_PROJECT]);
      const project = projectDetailSchema.parse((await client.get(`/api/projects/${projects[0].id}`).expect(200)).body);
      expect(project.frames.map((f) => [f.name, f.version])).toEqual([[DEMO_FRAME, 1]]);
      // The demo frame is the document model's demo kitchen pod: a real frame, not an empty one.
      const frame = (await client.get(`/api/frames/${project.frames[0].id}`).expect(200)).body as { document: { members: unknown[]; modules: unknown[] }; memberCount: number };
      expect(frame.memberCount).toBe(frame.document.members.length);
      expect(frame.memberCount).toBeGreaterThan(0);
      expect(frame.document.modules.length).toBeGreaterThan(0);
    }
  }, 60_000);
});
