import { z } from 'zod';

// Building blocks shared by the resource schemas.
export const idSchema = z.uuid({ message: 'Must be a UUID' });
export const isoDateSchema = z.iso.datetime({ offset: true });

export const nameSchema = z
  .string({ message: 'Required' })
  .trim()
  .min(1, { message: 'Must not be empty' })
  .max(120, { message: 'At most 120 characters' });

export const emailSchema = z
  .string({ message: 'Required' })
  .trim()
  .toLowerCase()
  .max(254, { message: 'At most 254 characters' })
  .pipe(z.email({ message: 'Not a valid e-mail address' }));

export const userRefSchema = z.object({ id: idSchema, name: z.string() });
export type UserRef = z.infer<typeof userRefSchema>;
