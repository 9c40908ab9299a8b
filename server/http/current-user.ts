import type { Request } from 'express';
import { UnauthenticatedError } from '../errors';

/** The signed-in user's id, or a 401. (The user row itself is checked by the auth middleware.) */
export function currentUserId(req: Request): string {
  const id = req.session?.userId;
  if (!id) throw new UnauthenticatedError();
  return id;
}
