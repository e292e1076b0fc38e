import bcrypt from 'bcryptjs';

/** bcrypt cost; 10 rounds keep sign-in near 60 ms on this class of machine. */
const COST = 10;

export function hashPassword(plain: string): Promise<string> {
  return bcrypt.hash(plain, COST);
}

export function verifyPassword(plain: string, hash: string): Promise<boolean> {
  return bcrypt.compare(plain, hash);
}
