import { z } from 'zod';
import { newPasswordSchema, personNameSchema } from '@/lib/auth/password-policy';

const tokenSchema = z.string().min(20, 'this link is incomplete').max(200);

export const lookupQuerySchema = z.object({ token: tokenSchema });

export const acceptBodySchema = z
  .object({ token: tokenSchema, name: personNameSchema.optional(), password: newPasswordSchema.optional() })
  .strict()
  .refine((b) => (b.name === undefined) === (b.password === undefined), { message: 'give both a name and a password, or neither', path: ['password'] });
