/**
 * The rules a convoy leader drives by, on synthetic descents: a cool-down stop is made at the crest, a named
 * waypoint (a lookout, a rest area) or road no steeper than 4 % over a 100 m parking stretch, never on the
 * downgrade; one stop first, two at most on a descent, each 5 to 30 minutes in whole minutes; the text quotes
 * each stop in the same words everywhere and says what the stops add to the day; and when nothing is enough
 * it names the brake, how far past which line, and what would change it (common practice, no published
 * source, for the stop rules; the lines are the step classes of docs/model.md).
 */

import { describe, expect, it } from "vitest";
import {
  adviseRig,
  DEFAULT_ADVICE_SETTINGS,
  renderDescentAdvice,
  stopText,
  type DescentAdvice,
  type PlannedStop,
  type RigAdvice,
} from "@/lib/advice";
import type { PlacedWaypoint, RouteProfile } from "@/lib/route";
import { resolveModel, type Rig } from "@/lib/thermal";
import { formatTemperature } from "@/lib/units";
import {
  benchDescent,
  benchesDescent,
  gradeAround,
  HEAVY_VAN as HEAVY_4WD,
  oneDescent,
  routeOf,
  SILLY_RIG,
  twoWheelDrive,
  UTE_VAN as UTE_4WD,
  UTE_VAN_LOW_GAIN as LOW_GAIN_4WD,
  waypointAt,
} from "./scenarios";

// Stops are the subject here: the rigs have no low range, which would hold most of these descents without one.
const UTE_VAN = twoWheelDrive(UTE_4WD);
const HEAVY_VAN = twoWheelDrive(HEAVY_4WD);
const UTE_VAN_LOW_GAIN = twoWheelDrive(LOW_GAIN_4WD);

const { maxStopGrade, maxStopS, minStopS, maxStops } = DEFAULT_ADVICE_SETTINGS;
/** Half the stretch a rig needs to park, m: the grade of a stop is measured over ±50 m. */
const PARKING_HALF_M = 50;

/** 8 % down for 8 km, 300 m flat, then a short descent: 1 km at 6.1 % (61 m down), with the heat carried in. */
const carriedIn = routeOf([
  { lengthM: 3000, grade: 0 },
  { lengthM: 8000, grade: -0.08 },
  { lengthM: 300, grade: 0 },
  { lengthM: 1000, grade: -0.061 },
  { lengthM: 3000, grade: 0 },
]);

interface Case {
  name: string;
  route: { profile: RouteProfile; descents: ReturnType<typeof oneDescent>["descents"] };
  rig: Rig;
  waypoints?: PlacedWaypoint[];
}

const cases: Case[] = [
  { name: "ute and caravan, 10 % for 2.1 km", route: oneDescent(-0.1, 2100), rig: UTE_VAN },
  { name: "ute and caravan, a bench mid-descent", route: benchDescent(), rig: UTE_VAN },
  { name: "6 t rig, 9 % for 10 km", route: oneDescent(-0.09, 10_000), rig: HEAVY_VAN },
  { name: "6 t rig, 12 % for 6 km", route: oneDescent(-0.12, 6000), rig: HEAVY_VAN },
  { name: "6 t rig, four 1.5 km pitches at 9 % with benches", route: benchesDescent(-0.09, 1500, 200, 4), rig: HEAVY_VAN },
  { name: "6 t rig, four 1.2 km pitches at 8 % with benches", route: benchesDescent(-0.08, 1200, 200, 4), rig: HEAVY_VAN },
  { name: "6 t rig, a short descent after a long one", route: carriedIn, rig: HEAVY_VAN },
  { name: "gain 0.5, 12 % for 4 km", route: oneDescent(-0.12, 4000), rig: UTE_VAN_LOW_GAIN },
];

const advised = new Map<string, RigAdvice>();
function adviceFor(c: Case): RigAdvice {
  if (!advised.has(c.name)) advised.set(c.name, adviseRig({ route: c.route.profile, descents: c.route.descents, rig: c.rig, waypoints: c.waypoints ?? [] }));
  return advised.get(c.name)!;
}

/** Every stop the advice offers on a descent: the plan's, and the ones driving as planned. */
function stopsOf(a: DescentAdvice): PlannedStop[][] {
  return [a.plan.stops, a.stop?.stops ?? []];
}

describe("where a cool-down stop is made", () => {
  it.each(cases)("never on a downgrade (or upgrade) steeper than 4 % over the parking stretch: $name", (c) => {
    for (const a of adviceFor(c).descents) {
      for (const stops of stopsOf(a)) {
        for (const s of stops) {
          expect(s.place.kind).not.toBe("waypoint"); // no waypoints here: every stop is judged by its grade
          const grade = gradeAround(c.route.profile, s.atM, PARKING_HALF_M);
          expect(Math.abs(grade), `${c.name}: stop at ${s.atM} m on ${(grade * 100).toFixed(1)} %`).toBeLessThanOrEqual(0.04 + 1e-9);
        }
      }
    }
  });

  it("is advised at all where there is a place to stand (the checks above are not empty)", () => {
    const withStops = cases.filter((c) => adviceFor(c).descents.some((a) => stopsOf(a).some((s) => s.length > 0)));
    expect(withStops.map((c) => c.name)).toEqual(
      expect.arrayContaining(["ute and caravan, a bench mid-descent", "6 t rig, four 1.5 km pitches at 9 % with benches", "6 t rig, a short descent after a long one"]),
    );
  });

  it("is 4 % at most by default, over a 100 m stretch", () => {
    expect(maxStopGrade).toBe(0.04);
    expect(DEFAULT_ADVICE_SETTINGS.parkingStretchM).toBe(100);
  });

  it("keeps a named waypoint's name, even where the road beside it is steep (it has its own place to stand)", () => {
    // on a steady 10 % descent the waypoint, 900 m past the crest, is the only place to stand where a stop helps
    const route = oneDescent(-0.1, 2100);
    const name = "Lookout No. 2 — Ridge Rd";
    const advice = adviseRig({ route: route.profile, descents: route.descents, rig: UTE_VAN, waypoints: [waypointAt(name, 3900)] });
    const a = advice.descents[0]!;
    const stops = stopsOf(a).flat();
    expect(stops.length).toBeGreaterThan(0);
    for (const s of stops) {
      expect(s.place).toEqual({ kind: "waypoint", name });
      expect(s.atM).toBe(3900);
    }
    const text = renderDescentAdvice(a, "metric").lines.join("\n");
    expect(text).toContain(`stop for ${Math.round(stops[0]!.durationS / 60)} minutes at ${name} (3.9 km)`);
  });

  it("goes back to the bench when the place nearer the crossing is on the downgrade", () => {
    const route = benchDescent();
    const a = adviseRig({ route: route.profile, descents: route.descents, rig: UTE_VAN }).descents[0]!;
    const s = a.stop!.stops[0]!;
    expect(s.atM).toBeGreaterThanOrEqual(4000);
    expect(s.atM).toBeLessThanOrEqual(4300);
  });
});

describe("how many cool-down stops, and how long", () => {
  it.each(cases)("at most two per descent, each 5 to 30 minutes in whole minutes: $name", (c) => {
    for (const a of adviceFor(c).descents) {
      for (const stops of stopsOf(a)) {
        expect(stops.length).toBeLessThanOrEqual(2);
        for (const s of stops) {
          expect(s.durationS).toBeLessThanOrEqual(30 * 60);
          expect(s.durationS).toBeGreaterThanOrEqual(5 * 60);
          expect(s.durationS % 60).toBe(0);
        }
      }
    }
    expect([maxStops, minStopS, maxStopS]).toEqual([2, 300, 1800]);
  });

  it("uses the second stop only when one is not enough (a very heavy rig on a long descent with benches)", () => {
    const c = cases.find((x) => x.name.startsWith("6 t rig, four 1.5 km"))!;
    const a = adviceFor(c).descents[0]!;
    const two = stopsOf(a).find((s) => s.length === 2);
    expect(two).toBeDefined();
    expect(two!.some((s) => s.capped)).toBe(true); // the model asks for more than 30 minutes: capped, not lengthened
  });

  it("gives a 1 km, 61 m descent no stop longer than 30 minutes, even with the heat of the descent before it", () => {
    const advice = adviceFor(cases.find((x) => x.name.includes("short descent"))!);
    const short = advice.descents.find((a) => a.descent.dropM < 70)!;
    expect(short.descent.dropM).toBeCloseTo(61, 0);
    expect(short.descent.endDistanceM - short.descent.startDistanceM).toBeCloseTo(1000, -1);
    const stops = stopsOf(short).flat();
    expect(stops.length).toBeGreaterThan(0);
    for (const s of stops) expect(s.durationS).toBeLessThanOrEqual(1800);
    expect(stops.some((s) => s.modelTimeS > 1800)).toBe(true); // the cooling model alone would ask for longer
  });
});

describe("the stops in words", () => {
  it("quote each stop in the same words in the plan and the stop line, and no other stop, with the time they add", () => {
    let checked = 0;
    for (const c of cases) {
      for (const a of adviceFor(c).descents) {
        if (a.plan.stops.length === 0) continue;
        checked++;
        const lines = renderDescentAdvice(a, "metric").lines;
        const planLine = lines.find((l) => l.startsWith("Plan:"))!;
        const stopLine = lines.find((l) => l.startsWith("Cool-down stop"))!;
        const own = a.plan.stops.map((s) => stopText(s, "metric"));
        for (const t of own) {
          expect(planLine).toContain(t);
          expect(stopLine).toContain(t);
        }
        const quoted = lines.join("\n").match(/stop for \d+ minutes? at [^;.(]+/g) ?? [];
        for (const q of quoted) expect(own.some((t) => t.startsWith(q.trim()))).toBe(true);
        const minutes = a.plan.stops.reduce((sum, s) => sum + s.durationS, 0) / 60;
        const adds = a.plan.stops.length === 1 ? `the stop adds ${minutes} min to the day` : `the two stops add ${minutes} min to the day`;
        expect(planLine).toContain(adds);
        expect(stopLine).toContain(adds);
      }
    }
    expect(checked).toBeGreaterThan(0);
  });
});

/** A phrase said in a text, whether or not it starts a sentence. */
function expectSaid(text: string, phrase: string): void {
  expect(text.toLowerCase()).toContain(phrase.toLowerCase());
}

describe("when stops are not enough", () => {
  /** The brake furthest past its fade-likely line in an outcome, found here from the outcome alone. */
  function worstHot(a: DescentAdvice) {
    const p = a.plan.outcome.positions.reduce((x, y) => (y.peakC - y.hotC > x.peakC - x.hotC ? y : x));
    return p;
  }

  it("names the brake, its peak and how far past the fade-likely line, and what would change it", () => {
    const route = oneDescent(-0.09, 10_000);
    // fresh DOT 5.1 (260 °C dry boiling point), so the reason is the fade-likely line, not the fluid
    const rig: Rig = { ...HEAVY_VAN, vehicle: { ...HEAVY_VAN.vehicle, brakeFluid: { fluidClass: "DOT 5.1", yearsSinceChange: 0 } } };
    const a = adviseRig({ route: route.profile, descents: route.descents, rig }).descents[0]!;
    expect(a.nothingIsEnough).toBe(true);
    const model = resolveModel(rig);
    // no fluid past its boiling point and no brake past its validity ceiling: the reason is the fade-likely line
    a.plan.outcome.positions.forEach((p, j) => {
      expect(p.peakFluidC === null || p.peakFluidC < p.boilC!).toBe(true);
      expect(p.peakC).toBeLessThan(model.positions[j]!.validityCeilingC);
    });
    const p = worstHot(a);
    const kind = model.positions.find((q) => q.position === p.position)!.kind === "drum" ? "drums" : "discs";
    const owner = p.position === "trailer" ? "caravan" : p.position;
    const metric = renderDescentAdvice(a, "metric").lines[0]!;
    expectSaid(metric, `the ${owner} ${kind} would still reach about ${formatTemperature(p.peakC, "metric")}, ${Math.round(p.peakC - p.hotC)} °C past their fade-likely line`);
    const imperial = renderDescentAdvice(a, "imperial").lines[0]!;
    expectSaid(imperial, `${formatTemperature(p.peakC, "imperial")}, ${Math.round(((p.peakC - p.hotC) * 9) / 5)} °F past their fade-likely line`);
    expectSaid(metric, "what would change it: carry less load");
    expectSaid(metric, "have a brake upgrade assessed by a licensed mechanic");
    expectSaid(metric, "choose another route");
    expect(metric.toLowerCase()).not.toContain("raise the brake controller's gain"); // the gain is already 1.0
    expect(metric).not.toMatch(/nothing is enough/i);
  });

  it("suggests a higher controller gain where the caravan's brakes are under-set, and fresh fluid where it boils", () => {
    const route = oneDescent(-0.12, 4000);
    const a = adviseRig({ route: route.profile, descents: route.descents, rig: UTE_VAN_LOW_GAIN }).descents[0]!;
    expect(a.trailer!.notes).toContain("check-raise-gain");
    expect(a.shortfall).not.toBeNull();
    expect(a.shortfall!.position).not.toBe("trailer");
    const text = renderDescentAdvice(a, "metric").lines[0]!;
    expectSaid(text, "raise the brake controller's gain (now 0.5)");
    expect(a.shortfall!.line).toBe("boil");
    {
      const p = a.plan.outcome.positions.find((q) => q.position === a.shortfall!.position)!;
      expectSaid(text, `the ${p.position} brake fluid would still reach about ${formatTemperature(p.peakFluidC!, "metric")}`);
      expectSaid(text, `${Math.round(p.peakFluidC! - p.boilC!)} °C past its estimated boiling point`);
      expectSaid(text, "have the brake fluid changed");
    }
  });

  it("says the brakes may fail where the plan runs away, and the rig is not advised", () => {
    const route = oneDescent(-0.12, 8000);
    const advice = adviseRig({ route: route.profile, descents: route.descents, rig: SILLY_RIG });
    const a = advice.descents[0]!;
    expect(a.plan.outcome.worstClass).toBe("runaway");
    expect(a.shortfall!.line).toBe("runaway");
    const line = renderDescentAdvice(a, "metric").lines[0]!;
    expect(line).toMatch(/the model can describe, so the brakes may fail there \(near [\d.]+ km\)/);
    // No temperature at or past a ceiling is printed as a number (docs/model.md, "Validity ceiling").
    const lowestCeiling = Math.min(...a.plan.outcome.positions.map((p) => p.ceilingC));
    const printed = [...line.matchAll(/(\d[\d,]*) °C/g)].map((m) => Number(m[1]!.replace(/,/g, "")));
    expect(printed.filter((c) => c >= lowestCeiling)).toEqual([]);
    expect(line).toContain("beyond Fadeline's range");
    expect(advice.verdict).toBe("not advised");
  });
});
