import { describe, expect, it } from 'vitest';
import { loggableError, toErrorResponse } from '../../server/http/error-handler';
import { createTestContext, truncateAll } from '../support/test-app';
import { User } from '../../server/modules/users/user.entity';

// What reaches the log when a request fails unexpectedly: never the statement's parameter values.

describe('loggableError', () => {
  it('a real database failure (a duplicate e-mail, inserted with its bcrypt hash) is logged without the values', async () => {
    const ctx = await createTestContext();
    try {
      await truncateAll(ctx.orm);
      const hash = '$2b$12$abcdefghijklmnopqrstuuSECRETSECRETSECRETSECRETSECR';
      const em = ctx.orm.em.fork();
      em.create(User, { email: 'twice@example.test', name: 'A', passwordHash: hash });
      await em.flush();
      const again = ctx.orm.em.fork();
      again.create(User, { email: 'twice@example.test', name: 'B', passwordHash: hash });
      const err = await again.flush().then(
        () => null,
        (e: unknown) => e,
      );
      expect(err).toBeInstanceOf(Error);
      expect((err as Error).message).toContain('SECRET'); // the ORM's own message carries the values…
      const line = loggableError(err);
      expect(line).not.toContain('SECRET'); // …what we log does not
      expect(line).not.toContain('twice@example.test');
      expect(line).toMatch(/23505/);
      expect(toErrorResponse(err).status).toBe(500);
    } finally {
      await ctx.close();
    }
  });

  it('an error with a 4xx status of its own maps to 400 or 413, never with its own wording', () => {
    const e = Object.assign(new Error('secret internals'), { status: 415, type: 'encoding.unsupported' });
    expect(toErrorResponse(e)).toMatchObject({ status: 400, unexpected: false });
    expect(JSON.stringify(toErrorResponse(e).body)).not.toContain('secret');
    expect(toErrorResponse(Object.assign(new Error('x'), { statusCode: 413 })).status).toBe(413);
    expect(toErrorResponse(new URIError('URI malformed')).status).toBe(400);
  });
});
