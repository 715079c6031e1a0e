/**
 * The analyze command's options: --set overrides, --advice, --reading calibration, bands on every peak, and
 * peaks past the validity ceiling reported as the ceiling.
 */
import { spawnSync } from "node:child_process";
import { writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { UTE_AND_CARAVAN } from "@/lib/thermal";
import { twoWheelDrive } from "../thermal/rig-helpers";

const GPX = "tests/fixtures/gpx/demo/tallowmere-to-kestrel-gap.gpx";
const RIG = ["--rig", "preset:ute-and-caravan"];
const run = (...args: string[]) => spawnSync(process.execPath, ["--import", "tsx", "scripts/analyze.ts", ...args], { encoding: "utf8" });
const json = (...args: string[]) => {
  const r = run(...args, "--json");
  expect(r.stderr).toBe("");
  expect(r.status).toBe(0);
  return JSON.parse(r.stdout);
};

interface Peak {
  peakC: number;
  beyondValidity: boolean;
  band: { lowC: number; highC: number };
}

/** A steep synthetic route: 1 km flat, 7 km at 14 % down, 2 km flat, points every 50 m along a meridian. */
function steepGpx(): string {
  const pts: string[] = [];
  let e = 1200;
  for (let i = 0; i <= 200; i++) {
    const x = i * 50;
    if (i > 0) e += (x > 1000 && x <= 8000 ? -0.14 : 0) * 50;
    pts.push(`<trkpt lat="${(-37 + x / 111_195).toFixed(7)}" lon="146.0000000"><ele>${e.toFixed(1)}</ele></trkpt>`);
  }
  const file = join(tmpdir(), `steep-${process.pid}.gpx`);
  writeFileSync(
    file,
    `<?xml version="1.0"?><gpx version="1.1" creator="fadeline tests" xmlns="http://www.topografix.com/GPX/1/1">` +
      `<trk><name>Steep test descent</name><trkseg>${pts.join("")}</trkseg></trk></gpx>`,
  );
  return file;
}

let baseline: {
  model: { params: Record<string, unknown> };
  peaks: Peak[];
  descents: { positions: Peak[] }[];
  positions: { validityCeilingC: number }[];
};
beforeAll(() => {
  baseline = json(GPX, ...RIG);
}, 30_000);

describe("bands on every peak", () => {
  it("every whole-route peak and every descent peak carries a band around it", () => {
    const all = [...baseline.peaks, ...baseline.descents.flatMap((d) => d.positions)];
    expect(all.length).toBeGreaterThan(3);
    for (const p of all) {
      expect(typeof p.band.lowC).toBe("number");
      expect(p.band.lowC).toBeLessThanOrEqual(p.peakC);
      expect(p.band.highC).toBeGreaterThanOrEqual(p.peakC);
      expect(typeof p.beyondValidity).toBe("boolean");
    }
    expect(baseline.descents.some((d) => d.positions.some((p) => p.band.highC - p.band.lowC > 20))).toBe(true);
  });

  it("the table prints peaks as about N °C (low–high)", () => {
    const out = run(GPX, ...RIG).stdout;
    expect(out).toMatch(/about \d+ °C \((\d+|beyond range)–(\d+|beyond range)\)/);
    expect(out).toContain("Bands: 10th–90th percentile of 8 heat runs");
  }, 30_000);
});

describe("--set", () => {
  it("shows the override in model.params and a lower cooling factor heats the brakes", () => {
    const r = json(GPX, ...RIG, "--set", "coolingFactor=0.6", "--set", "variableSpecificHeat=true");
    expect(r.model.params.coolingFactor).toBe(0.6);
    expect(r.model.params.variableSpecificHeat).toBe(true);
    expect(baseline.model.params.coolingFactor).toBe(1);
    // The second descent stays below the ceiling either way; its front peak rises with less cooling.
    expect(baseline.descents[1]!.positions[0]!.beyondValidity).toBe(false);
    expect(r.descents[1].positions[0].peakC).toBeGreaterThan(baseline.descents[1]!.positions[0]!.peakC + 10);
  }, 30_000);

  it("more engine braking cools the brakes", () => {
    const r = json(GPX, ...RIG, "--set", "engineBrakingScale=2");
    expect(r.model.params.engineBrakingScale).toBe(2);
    expect(r.descents[1].positions[0].peakC).toBeLessThan(baseline.descents[1]!.positions[0]!.peakC);
  }, 30_000);

  it("rejects an unknown name, listing the valid ones", () => {
    const r = run(GPX, ...RIG, "--set", "coolingFactr=2");
    expect(r.status).toBe(1);
    expect(r.stderr).toContain("--set coolingFactr: unknown parameter; valid names are ambientC, startTempC, coolingFactor");
    expect(r.stderr).toContain("engineBrakingScale");
  }, 30_000);

  it("shows the model's range error cleanly", () => {
    const r = run(GPX, ...RIG, "--set", "coolingFactor=20");
    expect(r.status).toBe(1);
    expect(r.stderr).toBe("analyze: invalid --set value: coolingFactor must be between 0 and 10\n");
    const t = run(GPX, ...RIG, "--set", "ambientC=warm");
    expect(t.status).toBe(1);
    expect(t.stderr).toContain("the value must be a number, true, false, null or JSON");
  }, 30_000);
});

/** The preset ute and caravan without a low range (a 2WD tow vehicle), whose advice on the demo pass has stops. */
function twoWheelDriveRig(): string {
  const file = join(tmpdir(), `rig-2wd-${process.pid}.json`);
  writeFileSync(file, JSON.stringify(twoWheelDrive(UTE_AND_CARAVAN)));
  return file;
}

describe("--advice", () => {
  it("adds the verdict and every cool-down stop as an object with atM and durationS", () => {
    const r = json(GPX, "--rig", twoWheelDriveRig(), "--advice");
    expect(["clear", "clear with advice", "not advised"]).toContain(r.advice.verdict);
    expect(r.advice.descents.length).toBeGreaterThan(0);
    expect(r.advice.stops.length).toBeGreaterThan(0);
    for (const s of r.advice.stops) {
      expect(typeof s.atM).toBe("number");
      expect(s.durationS).toBeGreaterThan(0);
      expect(s.atM).toBeGreaterThanOrEqual(0);
      expect(s.atM).toBeLessThanOrEqual(73_000);
    }
    const planStops = r.advice.descents.flatMap((d: { plan: { stops: unknown[] } }) => d.plan.stops);
    expect(r.advice.stops).toEqual(expect.arrayContaining(planStops));
    expect(r.advice.descents[0].lines[0]).toMatch(/^(Plan:|Nothing we can suggest)/);
  }, 60_000);

  it("prints the verdict and each descent's advice lines in the table", () => {
    const out = run(GPX, ...RIG, "--advice").stdout;
    expect(out).toMatch(/Verdict: (clear|clear with advice|not advised)\./);
    expect(out).toMatch(/\nPlan: before the crest at \d+\.\d km/);
    expect(out).toContain("Descent from 31.8 km");
  }, 60_000);
});

describe("--reading", () => {
  it("fits the factors, flags an impossible reading and re-forecasts with the fit", () => {
    const r = json(GPX, ...RIG, "--reading", "front@41=380", "--reading", "rear@41=330+10", "--reading", "front@1=900");
    const c = r.calibration;
    expect(c.fittedParameters).toEqual(["coolingFactor", "engineBrakingScale"]);
    expect(c.readings).toHaveLength(2);
    expect(c.flagged).toHaveLength(1);
    expect(c.flagged[0].reading).toEqual({ position: "front", atM: 1000, tempC: 900 });
    expect(c.flagged[0].reason).toMatch(/^hotter than any heat run/);
    expect(c.rmsAfterK).toBeLessThan(c.rmsBeforeK);
    expect(r.model.params.coolingFactor).toBe(c.fitted.coolingFactor);
    expect(r.model.params.engineBrakingScale).toBe(c.fitted.engineBrakingScale);
    // Cooler readings than forecast: the re-forecast peaks are lower than the rig's own.
    expect(r.peaks[0].peakC).toBeLessThan(baseline.peaks[0]!.peakC);
  }, 60_000);

  it("prints the fitted factors and the reading left out", () => {
    const out = run(GPX, ...RIG, "--reading", "front@41=380+2", "--reading", "rear@1=-10").stdout;
    expect(out).toMatch(/Calibration from 1 reading: cooling factor \d\.\d\d, engine braking 1\.00 \(kept\)/);
    expect(out).toContain("Left out: rear at 1.0 km, -10 °C: cooler than the air");
    expect(out).toContain("the cooling factor alone is fitted");
  }, 60_000);

  it("refuses a reading it cannot read", () => {
    const r = run(GPX, ...RIG, "--reading", "front=380");
    expect(r.status).toBe(1);
    expect(r.stderr).toContain("--reading front=380: expected <front|rear|trailer>@<km>=<°C>[+<minutes>]");
  }, 30_000);
});

describe("beyond the validity ceiling", () => {
  it("reports an overloaded rig's peaks on a steep descent as the ceiling, with beyondValidity", () => {
    const gpx = steepGpx();
    const rigFile = join(tmpdir(), `heavy-rig-${process.pid}.json`);
    writeFileSync(rigFile, JSON.stringify({ ...UTE_AND_CARAVAN, load: { ...UTE_AND_CARAVAN.load, trailerLoadKg: 1100 } }));
    const r = json(gpx, "--rig", rigFile);
    expect(r.worstClass).toBe("runaway");
    expect(r.trace.worstClass).toContain("runaway");
    const ceilings = r.positions.map((p: { validityCeilingC: number }) => p.validityCeilingC);
    const front = r.peaks[0];
    expect(front.beyondValidity).toBe(true);
    expect(front.peakC).toBe(ceilings[0]);
    for (const [j, p] of [...r.peaks.entries(), ...r.descents[0].positions.entries()] as [number, Peak][]) {
      expect(p.peakC).toBeLessThanOrEqual(ceilings[j]);
      expect(p.band.highC).toBeLessThanOrEqual(ceilings[j]);
    }
    r.trace.rotorC.forEach((col: number[], j: number) => expect(Math.max(...col)).toBeLessThanOrEqual(ceilings[j]));
    r.trace.band.highC.forEach((col: number[], j: number) => expect(Math.max(...col)).toBeLessThanOrEqual(ceilings[j]));
    const out = run(gpx, "--rig", rigFile).stdout;
    expect(out).toContain("front beyond range at");
    expect(out).not.toMatch(/about (6\d\d|[7-9]\d\d|\d{4}) °C/);
  }, 60_000);
});
