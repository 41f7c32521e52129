import bcrypt from 'bcryptjs';

export const BCRYPT_COST = 10;

export function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, BCRYPT_COST);
}

export function verifyPassword(password: string, hash: string): Promise<boolean> {
  return bcrypt.compare(password, hash);
}

/** A hash to compare against when the e-mail is unknown, so timing does not reveal accounts. */
export const DUMMY_HASH = '$2b$10$CwTycUXWue0Thq9StjUM0uJ8.XJ0vZcYF1fuYzqB7sQk0m6h8bX3a';
