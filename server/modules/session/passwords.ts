import argon2 from 'argon2';

// OWASP's argon2id baseline: 19 MiB memory, 2 iterations, 1 lane (SECURITY.md).
const options = {
  type: argon2.argon2id,
  memoryCost: 19 * 1024,
  timeCost: 2,
  parallelism: 1,
} as const;

/** Hashes a password with argon2id. */
export function hashPassword(password: string): Promise<string> {
  return argon2.hash(password, options);
}

// A real hash to verify against when the e-mail is unknown, so both cases take the same time.
let decoyHash: Promise<string> | undefined;

/** Checks a password against a stored hash (or a decoy when there is none). */
export async function verifyPassword(hash: string | null, password: string): Promise<boolean> {
  decoyHash ??= hashPassword('not-a-real-password-for-timing');
  const ok = await argon2.verify(hash ?? (await decoyHash), password).catch(() => false);
  return hash !== null && ok;
}
