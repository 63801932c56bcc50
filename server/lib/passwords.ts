import bcrypt from 'bcryptjs';

/** bcrypt cost for every stored password: sign-up, reset, the first admin and the demo accounts. */
export const BCRYPT_ROUNDS = 10;

export function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, BCRYPT_ROUNDS);
}
