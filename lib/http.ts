import "server-only";
import { z } from "zod";
import { AppError, type FieldErrors } from "./errors";

/** Bodies larger than this are refused before they are fully read (JSON endpoints). */
export const DEFAULT_JSON_LIMIT_BYTES = 64 * 1024;

/** zod's issues as field → messages, plus one sentence for the whole request. */
export function describeZodError(error: z.ZodError): { message: string; fields: FieldErrors } {
  const fields: FieldErrors = {};
  const general: string[] = [];
  for (const issue of error.issues) {
    if (issue.code === "unrecognized_keys") {
      general.push(`These fields are not accepted here: ${issue.keys.join(", ")}.`);
    } else if (issue.path.length === 0) {
      general.push(issue.message);
    } else {
      (fields[issue.path.join(".")] ??= []).push(issue.message);
    }
  }
  const message = general[0] ?? "Some fields need attention.";
  return { message, fields };
}

/** Parses a value with a schema or throws a 422 AppError carrying field errors. */
export function parseOrThrow<T>(schema: z.ZodType<T>, value: unknown): T {
  const result = schema.safeParse(value);
  if (result.success) return result.data;
  const { message, fields } = describeZodError(result.error);
  throw new AppError("invalid_input", message, fields);
}

async function readCapped(request: Request, maxBytes: number): Promise<string> {
  const declared = Number(request.headers.get("content-length") ?? "0");
  if (declared > maxBytes) throw tooLarge(maxBytes);
  if (!request.body) return "";
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let size = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    size += value.byteLength;
    if (size > maxBytes) {
      await reader.cancel();
      throw tooLarge(maxBytes);
    }
    chunks.push(value);
  }
  return new TextDecoder("utf-8", { fatal: false }).decode(Buffer.concat(chunks));
}

function tooLarge(maxBytes: number): AppError {
  return new AppError("payload_too_large", `The request body is larger than ${Math.round(maxBytes / 1024)} KB.`);
}

/**
 * Reads a JSON body: requires `Content-Type: application/json` (which a cross-site form cannot send without a
 * CORS preflight), stops reading past `maxBytes`, and validates with the schema.
 */
export async function readJson<T>(request: Request, schema: z.ZodType<T>, maxBytes = DEFAULT_JSON_LIMIT_BYTES) {
  const type = request.headers.get("content-type") ?? "";
  if (!/^application\/json\b/i.test(type)) {
    throw new AppError("unsupported_media_type", "Send the request body as JSON (Content-Type: application/json).");
  }
  const text = await readCapped(request, maxBytes);
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch {
    throw new AppError("bad_request", "The request body is not valid JSON.");
  }
  return parseOrThrow(schema, value);
}

const UNSAFE = new Set(["POST", "PUT", "PATCH", "DELETE"]);

/** Refuses state-changing requests whose Origin is another site (route handlers get no built-in check). */
export function assertSameOrigin(request: Request): void {
  if (!UNSAFE.has(request.method)) return;
  const origin = request.headers.get("origin");
  const site = request.headers.get("sec-fetch-site");
  if (site === "cross-site") throw new AppError("forbidden", "Cross-site requests are not accepted.");
  if (!origin) return;
  const host = request.headers.get("x-forwarded-host") ?? request.headers.get("host");
  let originHost: string | null = null;
  try {
    originHost = new URL(origin).host;
  } catch {
    originHost = null;
  }
  if (!host || originHost !== host) throw new AppError("forbidden", "Cross-site requests are not accepted.");
}

const CONNECTION_CODES = new Set(["ECONNREFUSED", "ECONNRESET", "ETIMEDOUT", "57P01", "57P03", "53300"]);

function isDatabaseUnavailable(error: unknown): boolean {
  if (!(error instanceof Error)) return false;
  const code = (error as { code?: string }).code ?? (error.cause as { code?: string } | undefined)?.code;
  return (code !== undefined && CONNECTION_CODES.has(code)) || /timeout exceeded when trying to connect/i.test(error.message);
}

/** Turns any thrown value into the JSON error shape; unknown errors are logged and answered generically. */
export function errorResponse(error: unknown): Response {
  if (error instanceof AppError) return Response.json(error.toJSON(), { status: error.status });
  if (isDatabaseUnavailable(error)) {
    console.error("[api] database unavailable:", (error as Error).message);
    const e = new AppError("unavailable", "Fadeline cannot reach its database right now. Try again in a minute.");
    return Response.json(e.toJSON(), { status: e.status });
  }
  console.error("[api] unexpected error:", error);
  const e = new AppError("internal", "Something went wrong on our side. Nothing was changed.");
  return Response.json(e.toJSON(), { status: e.status });
}

type Handler<C> = (request: Request, context: C) => Promise<Response>;

/** Wraps a route handler: origin check first, one error shape for every failure, `no-store` on replies. */
export function route<C>(handler: Handler<C>): Handler<C> {
  return async (request, context) => {
    let response: Response;
    try {
      assertSameOrigin(request);
      response = await handler(request, context);
    } catch (error) {
      response = errorResponse(error);
    }
    response.headers.set("cache-control", "no-store");
    return response;
  };
}
