import { z } from 'zod';
import { storable } from '../limits';

/** The storable-text check with the API's capitalised wording. */
export const text = <T extends z.ZodString>(s: T): T => storable(s, 'Must not contain NUL characters or broken Unicode');

// Building blocks shared by the resource schemas.
export const idSchema = z.uuid({ message: 'Must be a UUID' });
export const isoDateSchema = z.iso.datetime({ offset: true });

export const nameSchema = text(
  z
    .string({ message: 'Required' })
    .trim()
    .min(1, { message: 'Must not be empty' })
    .max(120, { message: 'At most 120 characters' }),
);

export const emailSchema = z
  .string({ message: 'Required' })
  .trim()
  .toLowerCase()
  .max(254, { message: 'At most 254 characters' })
  .pipe(z.email({ message: 'Not a valid e-mail address' }));

export const userRefSchema = z.object({ id: idSchema, name: z.string() });
export type UserRef = z.infer<typeof userRefSchema>;
