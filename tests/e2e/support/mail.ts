/** Reads what the local mail fake captured (its HTTP API), as the browser tests' window on e-mail. */
import { expect } from "@playwright/test";

interface Captured {
  to: string[];
  subject: string;
  text: string;
}

const api = () => process.env.DEV_MAIL_INBOX_URL ?? "http://127.0.0.1:2581";

/** Waits for the newest mail to `address` whose subject matches, and returns it. */
export async function waitForMail(address: string, subject: RegExp): Promise<Captured> {
  let found: Captured | undefined;
  await expect
    .poll(
      async () => {
        const response = await fetch(`${api()}/messages`);
        const messages = (await response.json()) as Captured[];
        found = messages.find((m) => m.to.includes(address) && subject.test(m.subject));
        return Boolean(found);
      },
      { timeout: 15_000, message: `a mail to ${address} matching ${subject}` },
    )
    .toBe(true);
  return found!;
}

/** The first link in a mail that goes to `path` on the app. */
export function linkTo(mail: Captured, path: string): string {
  const match = mail.text.match(new RegExp(`https?://\\S+${path}\\?token=[A-Za-z0-9_-]+`));
  if (!match) throw new Error(`no ${path} link in: ${mail.text}`);
  return match[0];
}
