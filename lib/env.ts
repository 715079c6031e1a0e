import "server-only";
import { z } from "zod";

const schema = z.object({
  DATABASE_URL: z.string().startsWith("postgres"),
  NEXTAUTH_SECRET: z.string().min(32, "NEXTAUTH_SECRET must be at least 32 characters of random data"),
  NEXTAUTH_URL: z.url(),
  SMTP_URL: z.string().regex(/^smtps?:\/\//, "SMTP_URL must start with smtp:// or smtps://"),
  MAIL_FROM: z.string().min(3),
  /** "1" turns on the captured-mail inbox page; only the local start and test commands set it. */
  FADELINE_DEV_INBOX: z.enum(["0", "1"]).default("0"),
  DEV_MAIL_INBOX_URL: z.url().optional(),
  /** How many reverse proxies in front of the app append to X-Forwarded-For (see lib/server/client-ip.ts). */
  TRUSTED_PROXY_HOPS: z.coerce.number().int().min(0).max(5).default(0),
});

export type Env = z.infer<typeof schema>;
let parsed: Env | undefined;

/** The validated server environment, read once. Throws a readable list of what is missing or wrong. */
export function env(): Env {
  if (parsed) return parsed;
  const result = schema.safeParse(process.env);
  if (!result.success) {
    const lines = result.error.issues.map((i) => `  ${i.path.join(".")}: ${i.message}`).join("\n");
    throw new Error(`Fadeline's environment is incomplete:\n${lines}\nSee .env.example.`);
  }
  parsed = result.data;
  return parsed;
}

/** Whether the development mail inbox exists in this process. */
export function devInboxEnabled(): boolean {
  return process.env.FADELINE_DEV_INBOX === "1" && Boolean(process.env.DEV_MAIL_INBOX_URL);
}
