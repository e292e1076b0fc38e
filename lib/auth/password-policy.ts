import { z } from 'zod';
import { COMMON_PASSWORDS } from '@/lib/auth/common-passwords';

export const PASSWORD_MIN_LENGTH = 10;

/** A new password: long enough, not a well-known one. Passwords are never logged. */
export const newPasswordSchema = z
  .string()
  .min(PASSWORD_MIN_LENGTH, `use at least ${PASSWORD_MIN_LENGTH} characters`)
  .max(200, 'use at most 200 characters')
  .refine((p) => !COMMON_PASSWORDS.has(p.toLowerCase()), 'this password is on a list of common passwords; choose another');

/** Also refuses a password that repeats the account's e-mail address or its local part. */
export function passwordDiffersFromEmail(password: string, email: string): boolean {
  const lower = password.toLowerCase();
  const address = email.toLowerCase();
  const local = address.split('@')[0] ?? '';
  return lower !== address && (local.length < 4 || !lower.includes(local));
}

export const emailSchema = z.string().trim().toLowerCase().email('enter a valid e-mail address').max(254);
export const personNameSchema = z.string().trim().min(1, 'enter your name').max(120, 'at most 120 characters');
