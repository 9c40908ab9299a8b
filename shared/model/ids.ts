import { z } from 'zod';
import { storable } from '../limits';

/**
 * Record ids: letters, digits, `_` and `-`. Dots are reserved for the datums a run generates (`run1.u0`,
 * `bay2.start`), so a user's id can never collide with one of those.
 */
export const idSchema = z
  .string()
  .min(1, 'must not be empty')
  .max(64, 'must be at most 64 characters')
  .regex(/^[A-Za-z0-9][A-Za-z0-9_-]*$/, 'must be letters, digits, "_" or "-"');

/** A reference to a datum: a user datum id or a generated one such as `run1.u2` or `bay-cooler.start`. */
export const datumRefSchema = z
  .string()
  .min(1, 'must not be empty')
  .max(100, 'must be at most 100 characters')
  .regex(/^[A-Za-z0-9][A-Za-z0-9_.-]*$/, 'must be a datum id');

export const nameSchema = storable(z.string().max(120, 'must be at most 120 characters'));
