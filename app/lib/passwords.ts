import 'server-only';
import bcrypt from 'bcryptjs';

const BCRYPT_COST = 10;
let dummyHash: string | undefined;

export async function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, BCRYPT_COST);
}

/**
 * Compares against the stored hash, or against a throw-away hash when there is no
 * account, so an unknown address costs the same time as a wrong password.
 */
export async function passwordMatches(password: string, storedHash: string | null | undefined): Promise<boolean> {
  dummyHash ??= bcrypt.hashSync('no account has this password', BCRYPT_COST);
  const matches = await bcrypt.compare(password, storedHash ?? dummyHash);
  return Boolean(storedHash) && matches;
}
