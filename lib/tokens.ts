import { createHash, randomBytes } from 'node:crypto';

/** 32 bytes (256 bits) from the CSPRNG, base64url: for share links, resets and invitations. */
export function newToken(): string {
  return randomBytes(32).toString('base64url');
}

export function hashToken(token: string): string {
  return createHash('sha256').update(token, 'utf8').digest('hex');
}
