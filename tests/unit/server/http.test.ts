/**
 * The JSON boundary of every route handler: HTTP semantics from RFC 9110 (413 Content Too Large, 415
 * Unsupported Media Type) and the error shape the foundation issue fixes: { error: { code, message, fields? } }.
 */
import { beforeAll, describe, expect, it } from "vitest";
import { z } from "zod";
import { applyTestEnv } from "../../support/test-env";

beforeAll(() => applyTestEnv());
const { readJson, route } = await import("@/lib/http");
const { AppError } = await import("@/lib/errors");

const schema = z.strictObject({ name: z.string().min(1, "Enter a name."), count: z.number().int() });

function post(body: BodyInit | null, headers: Record<string, string> = { "content-type": "application/json" }) {
  return new Request("http://127.0.0.1:3100/api/x", { method: "POST", body, headers, duplex: "half" } as RequestInit);
}

async function errorOf(promise: Promise<unknown>) {
  try {
    await promise;
  } catch (error) {
    if (error instanceof AppError) return error.toJSON().error;
    throw error;
  }
  throw new Error("expected an error");
}

describe("readJson", () => {
  it("parses a valid body", async () => {
    await expect(readJson(post(JSON.stringify({ name: "A", count: 2 })), schema)).resolves.toEqual({ name: "A", count: 2 });
  });
  it("refuses malformed JSON with 400", async () => {
    expect(await errorOf(readJson(post("{name:"), schema))).toEqual({ code: "bad_request", message: "The request body is not valid JSON." });
  });
  it("refuses other content types with 415", async () => {
    expect((await errorOf(readJson(post("name=A", { "content-type": "application/x-www-form-urlencoded" }), schema))).code).toBe("unsupported_media_type");
  });
  it("names missing fields and refuses extra ones", async () => {
    expect(await errorOf(readJson(post("{}"), schema))).toMatchObject({ code: "invalid_input", fields: { name: [expect.any(String)], count: [expect.any(String)] } });
    expect(await errorOf(readJson(post(JSON.stringify({ name: "A", count: 1, role: "owner" })), schema))).toMatchObject({
      code: "invalid_input",
      message: "These fields are not accepted here: role.",
    });
  });
  it("stops at the size limit, whether the length is declared, false or absent", async () => {
    const big = JSON.stringify({ name: "x".repeat(70_000), count: 1 });
    expect((await errorOf(readJson(post(big), schema))).code).toBe("payload_too_large");
    expect((await errorOf(readJson(post(big, { "content-type": "application/json", "content-length": "10" }), schema))).code).toBe("payload_too_large");
    const stream = new ReadableStream({
      start(c) {
        for (let i = 0; i < 100; i++) c.enqueue(new TextEncoder().encode("x".repeat(1024)));
        c.close();
      },
    });
    expect((await errorOf(readJson(post(stream), schema))).code).toBe("payload_too_large");
  });
});

describe("route()", () => {
  it("turns AppErrors into their status and unknown errors into a generic 500", async () => {
    const denied = await route(async () => {
      throw new AppError("forbidden", "No.");
    })(post("{}"), {});
    expect(denied.status).toBe(403);
    expect(await denied.json()).toEqual({ error: { code: "forbidden", message: "No." } });
    const crashed = await route(async () => {
      throw new Error("relation \"users\" does not exist at character 15");
    })(post("{}"), {});
    expect(crashed.status).toBe(500);
    expect(JSON.stringify(await crashed.json())).not.toContain("relation");
    expect(crashed.headers.get("cache-control")).toBe("no-store");
  });
  it("refuses state-changing requests from another origin (docs/security.md A9)", async () => {
    const ok = route(async () => Response.json({ ok: true }));
    const foreign = new Request("http://127.0.0.1:3100/api/x", { method: "POST", headers: { origin: "https://evil.example", host: "127.0.0.1:3100" } });
    expect((await ok(foreign, {})).status).toBe(403);
    const crossSite = new Request("http://127.0.0.1:3100/api/x", { method: "DELETE", headers: { "sec-fetch-site": "cross-site" } });
    expect((await ok(crossSite, {})).status).toBe(403);
    const same = new Request("http://127.0.0.1:3100/api/x", { method: "POST", headers: { origin: "http://127.0.0.1:3100", host: "127.0.0.1:3100" } });
    expect((await ok(same, {})).status).toBe(200);
  });
});
