import "server-only";
import nodemailer, { type Transporter } from "nodemailer";
import { env } from "@/lib/env";

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html: string;
}

let transport: Transporter | undefined;

function getTransport(): Transporter {
  // SMTP_URL points at the local fake in development and tests, at a real provider in production.
  transport ??= nodemailer.createTransport(env().SMTP_URL, { from: env().MAIL_FROM });
  return transport;
}

/** Sends one message. Addresses reach here validated; nodemailer encodes headers, so no CR/LF injection. */
export async function sendMail(mail: OutgoingMail): Promise<void> {
  await getTransport().sendMail({ ...mail, from: env().MAIL_FROM });
}

/** Absolute link into the app, for mails. */
export function appUrl(path: string): string {
  return new URL(path, env().NEXTAUTH_URL).toString();
}
