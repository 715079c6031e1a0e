import bcrypt from "bcryptjs";
import { createHash } from "node:crypto";

/**
 * bcrypt work factor. OWASP's Password Storage Cheat Sheet asks for at least 10; 11 costs about 0.15 s per
 * hash on our 2-core machines (pure-JS bcryptjs).
 */
export const BCRYPT_COST = 11;

/**
 * bcrypt reads only the first 72 bytes of its input (OWASP Password Storage Cheat Sheet), so two long
 * passwords sharing a 72-byte prefix would collide. We hash the UTF-8 password with SHA-256 first and give
 * bcrypt the 44-character base64 digest: every character of a 128-character password counts, and base64
 * contains no NUL byte.
 */
function prehash(password: string): string {
  return createHash("sha256").update(password.normalize("NFC"), "utf8").digest("base64");
}

export async function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(prehash(password), BCRYPT_COST);
}

export async function verifyPassword(password: string, hash: string): Promise<boolean> {
  return bcrypt.compare(prehash(password), hash);
}

/**
 * A real hash of a random secret, compared against when the e-mail matches no account, so that "no such
 * user" takes as long as "wrong password" (OWASP Authentication Cheat Sheet).
 */
let dummyHash: Promise<string> | undefined;
export async function verifyAgainstDummy(password: string): Promise<false> {
  dummyHash ??= hashPassword(createHash("sha256").update(String(Math.random())).digest("hex"));
  await bcrypt.compare(prehash(password), await dummyHash);
  return false;
}
