/** A message as the local mail fake (scripts/mail-fake.ts) captured it and lists it on its HTTP API. */
export interface CapturedMail {
  id: number;
  from: string;
  to: string[];
  subject: string;
  date: string;
  text: string;
  html: string | null;
}
