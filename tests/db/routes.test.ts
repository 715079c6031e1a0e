/**
 * Uploading routes through the data-access layer, the worker thread and PostgreSQL. Hostile inputs are the
 * docs/security.md §C cases; every one must give a clear message and store nothing, and the request thread
 * must keep answering while a hostile file is read (docs/security.md §0.3).
 */
import { readFileSync } from "node:fs";
import { count, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { getDb } from "../../db";
import { auditEvents, routes } from "../../db/schema";
import { getRoute, getRouteProfile, deleteRoute, listRoutes, renameRoute } from "../../lib/server/routes/routes-dal";
import { uploadRoute } from "../../lib/server/routes/upload-route";
import { makeTeam, makeUser } from "./fixtures";

const fixture = (name: string) => new Uint8Array(readFileSync(`tests/fixtures/gpx/${name}`));
let planner: { userId: string };
let viewer: { userId: string };
let outsider: { userId: string };
let org: string;

beforeAll(async () => {
  [planner, viewer, outsider] = await Promise.all([makeUser("Route Planner"), makeUser("Route Viewer"), makeUser("Outsider")]);
  org = await makeTeam("Gravel Pass Tours", [
    { userId: planner.userId, role: "planner" },
    { userId: viewer.userId, role: "viewer" },
  ]);
});

const rowCount = async () => (await getDb().select({ n: count() }).from(routes).where(eq(routes.organisationId, org)))[0]!.n;

describe("uploading a route", () => {
  it("stores the file and its profile, with descents and stats, and finds it again by content", async () => {
    const bytes = fixture("kestrel-gap-1-1.gpx");
    const first = await uploadRoute(getDb(), planner, org, { bytes, fileName: "../../Kestrel Gap.gpx" });
    expect(first.duplicate).toBe(false);
    expect(first.route.fileName).toBe("Kestrel Gap.gpx"); // folders stripped (docs/security.md C17)
    expect(first.route.lengthM).toBeGreaterThan(200);
    const again = await uploadRoute(getDb(), planner, org, { bytes, fileName: "copy.gpx" });
    expect(again).toMatchObject({ duplicate: true, route: { id: first.route.id } });
    const full = await getRoute(getDb(), viewer, first.route.id);
    expect(full.view.line.lat.length).toBeGreaterThan(1);
    const profile = await getRouteProfile(getDb(), viewer, first.route.id);
    expect(profile.distanceM.at(-1)).toBeCloseTo(full.stats.lengthM, 0);
    const audit = await getDb().select().from(auditEvents).where(eq(auditEvents.targetId, first.route.id));
    expect(audit.map((a) => a.action)).toEqual(["route.uploaded"]);
  });

  it("ten identical uploads at once store one route (docs/security.md E9)", async () => {
    const bytes = fixture("tarnwick-saddle-1-0.gpx");
    const before = await rowCount();
    const results = await Promise.all(Array.from({ length: 10 }, () => uploadRoute(getDb(), planner, org, { bytes, fileName: "t.gpx" })));
    expect(await rowCount()).toBe(before + 1);
    expect(new Set(results.map((r) => r.route.id)).size).toBe(1);
  });

  it("a viewer and an outsider are refused, and nothing is stored", async () => {
    const before = await rowCount();
    await expect(uploadRoute(getDb(), viewer, org, { bytes: fixture("kestrel-gap-1-1.gpx"), fileName: "x.gpx" })).rejects.toMatchObject({ code: "forbidden" });
    await expect(uploadRoute(getDb(), outsider, org, { bytes: fixture("kestrel-gap-1-1.gpx"), fileName: "x.gpx" })).rejects.toMatchObject({ code: "not_found" });
    expect(await rowCount()).toBe(before);
  });

  it.each([
    ["c01-xxe-file.gpx", /DOCTYPE/i],
    ["c03-billion-laughs.gpx", /DOCTYPE/i],
    ["c11-truncated.gpx", /./],
    ["c11-two-roots.gpx", /./],
    ["c12-empty.gpx", /The file is empty\./],
    ["c12-hello.gpx", /./],
    ["c12-png-renamed.gpx", /This file is a PNG image, not a GPX file\./],
    ["c12-utf16le-no-bom.gpx", /UTF-16 without a byte-order mark/],
    ["c13-kml.gpx", /./],
    ["c13-html.gpx", /./],
    ["c24-waypoints-only.gpx", /./],
  ])("refuses %s with a clear message and stores nothing", async (name, message) => {
    const before = await rowCount();
    const error = await uploadRoute(getDb(), planner, org, { bytes: fixture(`hostile/${name}`), fileName: name }).catch((e: unknown) => e);
    expect(error).toMatchObject({ code: expect.stringMatching(/invalid_input|unsupported_media_type/) });
    expect((error as Error).message).toMatch(message);
    expect((error as Error).message.length).toBeGreaterThan(10);
    expect(await rowCount()).toBe(before);
  });

  it("reads a UTF-16 file with a byte-order mark and a routes-only file", async () => {
    await expect(uploadRoute(getDb(), planner, org, { bytes: fixture("hostile/c12-utf16le-bom.gpx"), fileName: "u.gpx" })).resolves.toMatchObject({ duplicate: false });
    await expect(uploadRoute(getDb(), planner, org, { bytes: fixture("hostile/c23-route-only.gpx"), fileName: "r.gpx" })).resolves.toMatchObject({ duplicate: false });
  });

  it("keeps the event loop answering while a deeply nested file is read", async () => {
    const depth = 100_000;
    const hostile = `<?xml version="1.0"?><gpx xmlns="http://www.topografix.com/GPX/1/1" version="1.1"><extensions>${"<x>".repeat(depth)}${"</x>".repeat(depth)}</extensions></gpx>`;
    let worstGapMs = 0;
    let last = performance.now();
    const ticker = setInterval(() => {
      const now = performance.now();
      worstGapMs = Math.max(worstGapMs, now - last);
      last = now;
    }, 10);
    const error = await uploadRoute(getDb(), planner, org, { bytes: new TextEncoder().encode(hostile), fileName: "deep.gpx" }).catch((e: unknown) => e);
    clearInterval(ticker);
    expect((error as Error).message).toMatch(/nest/i);
    expect(worstGapMs).toBeLessThan(1000); // the bar: other requests answer within a second
  });
});

describe("managing routes", () => {
  it("planners rename and delete, viewers may not, other organisations see nothing", async () => {
    const { route } = await uploadRoute(getDb(), planner, org, { bytes: fixture("hostile/c25-bad-times.gpx"), fileName: "times.gpx" });
    await expect(renameRoute(getDb(), viewer, route.id, "Nope")).rejects.toMatchObject({ code: "forbidden" });
    await expect(getRoute(getDb(), outsider, route.id)).rejects.toMatchObject({ code: "not_found" });
    await renameRoute(getDb(), planner, route.id, "Bad times road");
    expect((await listRoutes(getDb(), viewer, org)).find((r) => r.id === route.id)?.name).toBe("Bad times road");
    await expect(deleteRoute(getDb(), viewer, route.id)).rejects.toMatchObject({ code: "forbidden" });
    await deleteRoute(getDb(), planner, route.id);
    await expect(getRoute(getDb(), planner, route.id)).rejects.toMatchObject({ code: "not_found" });
  });
});
