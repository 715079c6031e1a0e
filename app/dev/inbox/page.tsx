import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { Brand } from "@/components/brand";
import { devInboxEnabled } from "@/lib/env";
import { listCapturedMail } from "@/lib/server/dev-inbox";

export const metadata: Metadata = { title: "Local inbox", robots: { index: false } };
export const dynamic = "force-dynamic";

/** Splits mail text into plain text and clickable links (rendered as React text, never as HTML). */
function Linkified({ text }: { text: string }) {
  const parts = text.split(/(https?:\/\/[^\s]+)/g);
  return (
    <>
      {parts.map((part, i) =>
        /^https?:\/\//.test(part) ? (
          <a key={i} href={part} className="break-all text-pine-700 underline">{part}</a>
        ) : (
          <span key={i}>{part}</span>
        ),
      )}
    </>
  );
}

/** Development only: the mail the local SMTP fake captured. 404 unless FADELINE_DEV_INBOX=1. */
export default async function DevInboxPage() {
  if (!devInboxEnabled()) notFound();
  let messages: Awaited<ReturnType<typeof listCapturedMail>> = [];
  let problem: string | null = null;
  try {
    messages = await listCapturedMail();
  } catch (error) {
    problem = `The mail fake is not answering (${(error as Error).message}). Start it with scripts/start.sh.`;
  }
  return (
    <div className="mx-auto max-w-3xl px-4 py-8">
      <Brand className="mb-6" />
      <h1 className="text-2xl font-semibold">Local inbox</h1>
      <p className="mt-1 text-sm text-ink-muted">
        Mail sent while running locally is caught here instead of being delivered. This page does not exist in production.
      </p>
      {problem && <p className="mt-4 text-sm text-danger-600">{problem}</p>}
      {!problem && messages.length === 0 && <p className="mt-6 text-sm text-ink-muted">No mail yet.</p>}
      <ul className="mt-6 space-y-4">
        {messages.map((m) => (
          <li key={m.id} className="rounded-lg border border-line bg-surface p-4">
            <p className="text-xs text-ink-muted">
              {new Date(m.date).toLocaleString()} · to {m.to.join(", ")}
            </p>
            <h2 className="mt-1 font-semibold">{m.subject}</h2>
            <p className="mt-2 whitespace-pre-wrap text-sm"><Linkified text={m.text} /></p>
          </li>
        ))}
      </ul>
    </div>
  );
}
