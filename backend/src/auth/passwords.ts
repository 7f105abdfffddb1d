import bcrypt from 'bcryptjs';

/** bcrypt cost: 2^10 rounds, about 60 ms per hash in pure JavaScript on one core. */
const COST = 10;
export const MIN_PASSWORD_LENGTH = 10;

export function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, COST);
}

export function verifyPassword(password: string, hash: string): Promise<boolean> {
  return bcrypt.compare(password, hash);
}

/** A hash to compare against when the account does not exist, so timing does not reveal it. */
export const DUMMY_HASH = bcrypt.hashSync('not-a-real-password', COST);
