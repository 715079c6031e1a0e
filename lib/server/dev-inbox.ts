import "server-only";
import type { CapturedMail } from "@/lib/dev-mail";

/** Mail the local fake (scripts/mail-fake.ts) has captured, newest first. */
export async function listCapturedMail(): Promise<CapturedMail[]> {
  const base = process.env.DEV_MAIL_INBOX_URL;
  if (!base) return [];
  const response = await fetch(new URL("/messages", base), { cache: "no-store", signal: AbortSignal.timeout(3000) });
  if (!response.ok) throw new Error(`mail fake answered ${response.status}`);
  return (await response.json()) as CapturedMail[];
}
