/**
 * Local stand-in for a hosted SMTP service. It accepts every message on 127.0.0.1 (no TLS, no auth), keeps
 * the last 500 in memory, and lists them on a loopback HTTP API that the development inbox page and the
 * browser tests read:
 *   GET    /messages        newest first: { id, from, to, subject, date, text, html }
 *   DELETE /messages        forget all
 * Never used in production: a deploy points SMTP_URL at a real provider.
 */
import { createServer } from "node:http";
import { simpleParser } from "mailparser";
import { SMTPServer } from "smtp-server";
import { parseArgs } from "node:util";
import type { CapturedMail as Captured } from "../lib/dev-mail";


const { values } = parseArgs({
  options: { "smtp-port": { type: "string", default: "2525" }, "http-port": { type: "string", default: "2580" } },
});
const HOST = "127.0.0.1";
const KEEP = 500;
const MAX_MESSAGE_BYTES = 5 * 1024 * 1024;
const messages: Captured[] = [];
let nextId = 1;

const smtp = new SMTPServer({
  authOptional: true,
  disabledCommands: ["STARTTLS", "AUTH"],
  size: MAX_MESSAGE_BYTES,
  logger: false,
  async onData(stream, session, callback) {
    try {
      const mail = await simpleParser(stream);
      messages.unshift({
        id: nextId++,
        from: mail.from?.text ?? "",
        to: session.envelope.rcptTo.map((r) => r.address),
        subject: mail.subject ?? "",
        date: (mail.date ?? new Date()).toISOString(),
        text: mail.text ?? "",
        html: typeof mail.html === "string" ? mail.html : null,
      });
      messages.length = Math.min(messages.length, KEEP);
      callback();
    } catch (error) {
      callback(error instanceof Error ? error : new Error("could not read the message"));
    }
  },
});

const http = createServer((req, res) => {
  res.setHeader("content-type", "application/json");
  if (req.url === "/messages" && req.method === "GET") return res.end(JSON.stringify(messages));
  if (req.url === "/messages" && req.method === "DELETE") {
    messages.length = 0;
    return res.end("[]");
  }
  res.statusCode = 404;
  res.end(JSON.stringify({ error: "not found" }));
});

smtp.listen(Number(values["smtp-port"]), HOST, () => console.log(`mail fake: SMTP on ${HOST}:${values["smtp-port"]}`));
http.listen(Number(values["http-port"]), HOST, () => console.log(`mail fake: API on ${HOST}:${values["http-port"]}`));

for (const signal of ["SIGINT", "SIGTERM"] as const) {
  process.on(signal, () => {
    smtp.close(() => http.close(() => process.exit(0)));
  });
}
