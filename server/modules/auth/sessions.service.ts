import type { EntityManager } from '@mikro-orm/postgresql';
import { SESSION_TABLE } from '../../mikro-orm.config';

/** Ends every stored session of a user, but the one with `keepSid` (the caller's own, when it stays signed in). */
export async function endSessionsOf(em: EntityManager, userId: string, keepSid?: string): Promise<number> {
  const res = await em.execute<{ sid: string }[]>(
    `delete from "${SESSION_TABLE}" where sess->>'userId' = ? and sid <> ? returning sid`,
    [userId, keepSid ?? ''],
  );
  return res.length;
}
