import "server-only";
import { createHash, randomBytes } from "node:crypto";

/** 32 bytes from the CSPRNG (256 bits, ASVS 11.5.1 asks for ≥ 128) as 43 base64url characters. */
export function newToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString("base64url");
  return { token, hash: hashToken(token) };
}

/** What the database keeps instead of a token: its SHA-256, hex. */
export function hashToken(token: string): string {
  return createHash("sha256").update(token, "utf8").digest("hex");
}
