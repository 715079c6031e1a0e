/** An in-process SMTP server for tests that send mail: collects what arrives, parsed. */
import type { AddressInfo } from "node:net";
import { simpleParser } from "mailparser";
import { SMTPServer } from "smtp-server";

export interface CapturedMessage {
  to: string[];
  subject: string;
  text: string;
  html: string;
  headers: Map<string, unknown>;
}

export async function startSmtpCapture(): Promise<{ url: string; messages: CapturedMessage[]; close: () => Promise<void> }> {
  const messages: CapturedMessage[] = [];
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ["STARTTLS", "AUTH"],
    logger: false,
    async onData(stream, session, callback) {
      const mail = await simpleParser(stream);
      messages.push({
        to: session.envelope.rcptTo.map((r) => r.address),
        subject: mail.subject ?? "",
        text: mail.text ?? "",
        html: typeof mail.html === "string" ? mail.html : "",
        headers: mail.headers,
      });
      callback();
    },
  });
  await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
  const { port } = server.server.address() as AddressInfo;
  return {
    url: `smtp://127.0.0.1:${port}`,
    messages,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}

/** The first link to the app found in a mail's text. */
export function linkIn(message: CapturedMessage | undefined, path: string): string {
  const match = message?.text.match(new RegExp(`https?://[^\\s]+${path.replace("/", "\\/")}\\?token=[A-Za-z0-9_-]+`));
  if (!match) throw new Error(`no ${path} link in mail: ${message?.text ?? "(no mail)"}`);
  return match[0];
}

export const tokenOf = (link: string) => new URL(link).searchParams.get("token") ?? "";
