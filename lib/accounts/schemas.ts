import { z } from 'zod';
import { emailSchema, newPasswordSchema, personNameSchema } from '@/lib/auth/password-policy';

export const signUpBodySchema = z.object({ name: personNameSchema, email: emailSchema, password: newPasswordSchema }).strict();
export type SignUpBody = z.infer<typeof signUpBodySchema>;

export const resetRequestBodySchema = z.object({ email: emailSchema }).strict();

export const resetConfirmBodySchema = z
  .object({ token: z.string().min(20, 'this link is incomplete').max(200), password: newPasswordSchema })
  .strict();
