/** The analyze command as a user runs it: a table per descent, JSON on request, and clear refusals. */
import { execFileSync, spawnSync } from "node:child_process";
import { writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { UTE_AND_CARAVAN } from "@/lib/thermal";

const GPX = "tests/fixtures/gpx/demo/tallowmere-to-kestrel-gap.gpx";
const run = (...args: string[]) => spawnSync(process.execPath, ["--import", "tsx", "scripts/analyze.ts", ...args], { encoding: "utf8" });

describe("npm run analyze", () => {
  it("prints one row per descent and the caution", () => {
    const out = execFileSync(process.execPath, ["--import", "tsx", "scripts/analyze.ts", GPX, "--rig", "preset:ute-and-caravan"], { encoding: "utf8" });
    expect(out).toMatch(/^Route 72\.\d km, \d+ descents/);
    expect(out).toContain("front peak °C");
    expect(out).toContain("Estimates only");
  }, 30_000);

  it("prints the analysis result as JSON with --json, from a rig file", () => {
    const file = join(tmpdir(), `rig-${process.pid}.json`);
    writeFileSync(file, JSON.stringify(UTE_AND_CARAVAN));
    const result = run(GPX, "--rig", file, "--json");
    expect(result.status).toBe(0);
    const parsed = JSON.parse(result.stdout);
    expect(parsed.descents[0].positions.map((p: { position: string }) => p.position)).toEqual(["front", "rear", "trailer"]);
    expect(parsed.trace.distanceM.length).toBeGreaterThan(100);
  }, 30_000);

  it("refuses a rig that does not fit the schema, naming the field", () => {
    const file = join(tmpdir(), `bad-rig-${process.pid}.json`);
    writeFileSync(file, JSON.stringify({ ...UTE_AND_CARAVAN, vehicle: { ...UTE_AND_CARAVAN.vehicle, gvmKg: 3.15 } }));
    const result = run(GPX, "--rig", file);
    expect(result.status).toBe(1);
    expect(result.stderr).toContain("vehicle.gvmKg: The GVM must be between 500 and 12000 kg.");
  }, 30_000);
});
