import { createHash, randomBytes } from 'node:crypto';

/** A new link token: 256 random bits, base64url (43 characters). Only its digest is stored. */
export function newLinkToken(): string {
  return randomBytes(32).toString('base64url');
}

/** The SHA-256 of a token as lower-case hex: what the database keeps and looks up. */
export function tokenDigest(token: string): string {
  return createHash('sha256').update(token, 'utf8').digest('hex');
}

/** True for text that could be a token we issued (so junk never reaches the database). */
export function isWellFormedToken(value: string): boolean {
  return /^[A-Za-z0-9_-]{43}$/.test(value);
}
