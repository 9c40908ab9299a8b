// Demo data for a first run: an invented van-conversion workshop with one person per role (the client let into
// the demo project only), one project and
// one frame. Runs only when the demo workshop does not exist yet, so running it again changes nothing.
//   tsx scripts/seed.ts        (reads DATABASE_URL through server/config.ts)
import { pathToFileURL } from 'node:url';
import bcrypt from 'bcryptjs';
import type { FrameDocumentJson } from '@shared/api/frames';
import type { Role } from '@shared/api/roles';
import { demoFrameDocument } from '@shared/model/demo-frame';
import { loadConfig } from '../server/config';
import { createOrm, type Orm } from '../server/db';
import { checkFrameDocument } from '../server/modules/frames/frame-document';
import { Frame } from '../server/modules/frames/frame.entity';
import { Project } from '../server/modules/projects/project.entity';
import { User, type UserEntity } from '../server/modules/users/user.entity';
import { Membership } from '../server/modules/workshops/membership.entity';
import { Workshop } from '../server/modules/workshops/workshop.entity';
import { ProjectClient } from '../server/modules/access/project-client.entity';

export const DEMO_WORKSHOP = 'Harbour Lane Van Works';
export const DEMO_PASSWORD = 'slotwright-demo';
export const DEMO_PROJECT = 'Rear kitchen pod — short-wheelbase van';
export const DEMO_FRAME = 'Kitchen pod v1';

export const DEMO_USERS: readonly { email: string; name: string; role: Role }[] = [
  { email: 'dana@slotwright.test', name: 'Dana Whitlock', role: 'owner' },
  { email: 'rui@slotwright.test', name: 'Rui Santos', role: 'designer' },
  { email: 'sam@slotwright.test', name: 'Sam Keller', role: 'cutter' },
  { email: 'jo@slotwright.test', name: 'Jo Park', role: 'viewer' },
  { email: 'lee@slotwright.test', name: 'Lee Marsh', role: 'client' },
];

/** The demo frame's document: the engine's invented rear kitchen pod (shared/model/demo-frame.ts). */
function demoFrameJson(): FrameDocumentJson {
  return { ...demoFrameDocument(), name: DEMO_FRAME } as unknown as FrameDocumentJson;
}

/** Creates the demo data unless the demo workshop exists; returns whether it created anything. */
export async function seedDemoData(orm: Orm): Promise<boolean> {
  return orm.em.fork().transactional(async (em) => {
    if (await em.count(Workshop, { name: DEMO_WORKSHOP })) return false;
    const hash = await bcrypt.hash(DEMO_PASSWORD, 12);
    const workshop = em.create(Workshop, { name: DEMO_WORKSHOP });
    const users = new Map<Role, UserEntity>();
    for (const d of DEMO_USERS) {
      // Someone may already have signed up with a demo address; they join the workshop as they are.
      const user = (await em.findOne(User, { email: d.email })) ?? em.create(User, { email: d.email, name: d.name, passwordHash: hash });
      // The client is let into the demo project only, not into the workshop.
      if (d.role !== 'client') em.create(Membership, { workshop, user, role: d.role });
      users.set(d.role, user);
    }
    const project = em.create(Project, {
      workshop,
      name: DEMO_PROJECT,
      client: 'Lee Marsh',
      notes: 'Pod behind the rear doors: pantry pull-out, compressor cooler, 30 L fresh water tank and a cooktop drawer. Invented demo job.',
    });
    const client = users.get('client');
    if (client) em.create(ProjectClient, { project, user: client });
    const { document, memberCount } = checkFrameDocument(demoFrameJson());
    em.create(Frame, {
      project,
      name: DEMO_FRAME,
      document,
      version: 1,
      memberCount,
      savedAt: new Date(),
      savedBy: users.get('designer') ?? null,
    });
    return true;
  });
}

/** Connects with DATABASE_URL (or the given URL), seeds, disconnects. */
export async function runSeed(databaseUrl?: string): Promise<boolean> {
  const config = loadConfig(databaseUrl ? { ...process.env, DATABASE_URL: databaseUrl } : process.env);
  const orm = await createOrm(config);
  try {
    return await seedDemoData(orm);
  } finally {
    await orm.close(true);
  }
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) {
  runSeed().then(
    (created) => console.log(created ? `Demo data created: workshop "${DEMO_WORKSHOP}", sign in as dana@slotwright.test / ${DEMO_PASSWORD}` : 'Demo data already present.'),
    (err: unknown) => {
      console.error(`seed: ${err instanceof Error ? err.message : String(err)}`);
      process.exit(1);
    },
  );
}
