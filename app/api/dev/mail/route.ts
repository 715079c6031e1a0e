import { notFound } from "@/lib/errors";
import { route } from "@/lib/http";
import { devInboxEnabled } from "@/lib/env";
import { listCapturedMail } from "@/lib/server/dev-inbox";

/** GET /api/dev/mail: mail captured by the local fake. Exists only when FADELINE_DEV_INBOX=1. */
export const GET = route(async () => {
  if (!devInboxEnabled()) throw notFound("This page");
  return Response.json({ messages: await listCapturedMail() });
});
