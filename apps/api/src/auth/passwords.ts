import { hash, verify } from '@node-rs/argon2';

// argon2id with the library's defaults (OWASP-level memory cost).
export const hashPassword = (password: string): Promise<string> => hash(password);

// Verifying against a fixed hash when the e-mail is unknown keeps both failures equally slow.
const unknownUserHash = hash('tressury-unknown-user-placeholder');

export async function verifyPassword(passwordHash: string | null, password: string): Promise<boolean> {
  const target = passwordHash ?? (await unknownUserHash);
  const matches = await verify(target, password).catch(() => false);
  return passwordHash !== null && matches;
}
