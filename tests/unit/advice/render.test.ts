/**
 * Advice text: in metric or imperial, each piece of advice carrying its re-run result ("With this
 * …"), the figures being the re-run's own, converted exactly (°F = °C × 9/5 + 32; 1 mi = 1609.344 m, NIST SP 811
 * App. B), and speeds rounded down (never faster than advised).
 */

import { describe, expect, it } from "vitest";
import { adviseRig, renderDescentAdvice, renderRigAdvice, speedLimitText, type DescentAdvice } from "@/lib/advice";
import { twoDescents, UTE_VAN, UTE_VAN_LOW_GAIN } from "./scenarios";

const route = twoDescents();
const advice = adviseRig({ route: route.profile, descents: route.descents, rig: UTE_VAN_LOW_GAIN });
const a = advice.descents[0]!;
const metric = renderDescentAdvice(a, "metric");
const imperial = renderDescentAdvice(a, "imperial");

/** The "With this …: <figures>" part of a line, as a list of numbers with their unit. */
function figuresAfter(line: string, lead: RegExp): { value: number; unit: string }[] {
  const m = line.match(lead);
  expect(m, line).not.toBeNull();
  const rest = line.slice(m!.index! + m![0].length);
  const upTo = rest.indexOf(":");
  return [...rest.slice(0, upTo).matchAll(/(-?[\d,]+) (°C|°F)/g)].map((x) => ({ value: Number(x[1]!.replace(/,/g, "")), unit: x[2]! }));
}

const lineOf = (lines: string[], start: string) => lines.find((l) => l.startsWith(start))!;

describe("advice text", () => {
  it("uses metric units in metric and imperial units in imperial", () => {
    const m = metric.lines.join("\n");
    const i = imperial.lines.join("\n");
    const metricUnits = [/\d °C/, /\d km\/h/, /\d km\b/, /\d m\b/];
    const imperialUnits = [/\d °F/, /\d mph/, /\d mi\b/, /\d ft\b/];
    for (const unit of metricUnits) expect(m).toMatch(unit);
    for (const unit of imperialUnits) expect(i).toMatch(unit);
    for (const unit of imperialUnits) expect(m).not.toMatch(unit);
    for (const unit of metricUnits) expect(i).not.toMatch(unit);
    expect(metric.title).toMatch(/ km to .* km: \d+ m down/);
    expect(imperial.title).toMatch(/ mi to .* mi: [\d,]+ ft down/);
  });

  it("carries the re-run result on every line of advice (plan, gear, speed, stops, gain)", () => {
    for (const text of [metric, imperial]) {
      expect(lineOf(text.lines, "Plan:")).toMatch(/With this plan: /);
      expect(lineOf(text.lines, "Gear:")).toMatch(/With this advice: /);
      expect(lineOf(text.lines, "Speed:")).toMatch(/With this advice: /);
      if (a.stop && a.stop.stops.length > 0) expect(lineOf(text.lines, "Cool-down stop")).toMatch(/With these stops: /);
      if (a.trailer?.gainOneOutcome) expect(text.lines.join("\n")).toMatch(/With the gain at 1\.0: /);
    }
  });

  it("gives the re-run's own peaks, in °C and exactly converted to °F", () => {
    const cases: [string, RegExp, DescentAdvice["baseline"]][] = [
      ["Plan:", /With this plan: /, a.plan.outcome],
      ["Gear:", /With this advice: /, a.gear.outcome],
      ["Speed:", /With this advice: /, a.speed.outcome],
    ];
    for (const [start, lead, outcome] of cases) {
      const c = figuresAfter(lineOf(metric.lines, start), lead);
      const f = figuresAfter(lineOf(imperial.lines, start), lead);
      expect(c.map((x) => x.value)).toEqual(outcome.positions.map((p) => Math.round(p.peakC)));
      expect(f.map((x) => x.value)).toEqual(outcome.positions.map((p) => Math.round((p.peakC * 9) / 5 + 32)));
      expect(new Set(c.map((x) => x.unit))).toEqual(new Set(["°C"]));
      expect(new Set(f.map((x) => x.unit))).toEqual(new Set(["°F"]));
    }
  });

  it("rounds speeds down in the user's unit (never faster than advised)", () => {
    expect(speedLimitText(45 / 3.6, "metric")).toBe("45 km/h");
    expect(speedLimitText(45 / 3.6, "imperial")).toBe("27 mph"); // 27.96 mph, rounded down
    expect(speedLimitText(44.99 / 3.6, "metric")).toBe("44 km/h");
    if (a.speed.speedMs !== null) expect(lineOf(imperial.lines, "Speed:")).toContain(`keep to ${speedLimitText(a.speed.speedMs, "imperial")}`);
  });

  it("names the caravan in its own word, and the rig's text opens with the verdict", () => {
    const trailer = renderDescentAdvice(a, "metric", { trailerNoun: "camper" }).lines.join("\n");
    expect(trailer).toContain("camper");
    expect(trailer).not.toContain("caravan");
    const rig = renderRigAdvice(advice, "imperial");
    expect(rig[0]).toBe(`Verdict: ${advice.verdict}.`);
    expect(rig.filter((l) => l.startsWith("Plan:"))).toHaveLength(advice.descents.length);
  });

  it("a rig with a stop in its advice gets the standstill cautions; the stopping line gives hot beside cold", () => {
    const plain = adviseRig({ route: route.profile, descents: route.descents, rig: UTE_VAN }).descents[0]!;
    const text = renderDescentAdvice(plain, "metric");
    if ((plain.stop?.stops.length ?? 0) > 0 || plain.plan.stops.length > 0) expect(text.cautions.length).toBeGreaterThan(0);
    const stopping = lineOf(text.lines, "Stopping from 80 km/h");
    expect(stopping).toMatch(/about \d+ m with cold brakes, \d+ m as planned, \d+ m with the plan\./);
    expect(lineOf(renderDescentAdvice(plain, "imperial").lines, "Stopping from 50 mph")).toMatch(/\d+ ft with cold brakes/);
  });
});
