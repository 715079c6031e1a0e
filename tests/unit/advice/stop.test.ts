/**
 * Cool-down stops: placed before the brakes would cross the fade (hot) line, where a rig can stand (the crest,
 * a named waypoint, or road no steeper than 4 % over a 100 m parking stretch, never on the downgrade), named
 * after a waypoint within a few hundred metres, lasting what the standstill cooling model needs (lib/thermal
 * standstillTimeToReach), rounded up to whole minutes (at least 5, at most 30), and proven by a full re-run
 * with HeatRunOptions.stops. The cooling law is docs/model.md (exact exponential for convection only); where
 * to stop is common practice, no published source.
 */

import { describe, expect, it } from "vitest";
import { adviseRig, DEFAULT_ADVICE_SETTINGS, isBelow, outcomeOf, stopDuration, stopTargets, type PlannedStop } from "@/lib/advice";
import { firstCrossing, nearestIndex } from "@/lib/advice/stop-place";
import { resolveModel, runHeatRun, standstillTimeToReach } from "@/lib/thermal";
import { benchDescent, gradeAround, oneDescent, UTE_VAN, waypointAt } from "./scenarios";

const route = benchDescent(); // crest at 3.0 km, bench (2 % down) from 4.0 to 4.3 km, bottom at 5.1 km
const { descent } = route;
const { maxStopGrade, minStopS, maxStopS } = DEFAULT_ADVICE_SETTINGS;

function stopAdvice(waypoints = [waypointAt("Saddle Bay", 3900)]) {
  const a = adviseRig({ route: route.profile, descents: route.descents, rig: UTE_VAN, waypoints }).descents[0]!;
  expect(a.stop).not.toBeNull();
  return a.stop!;
}

describe("cool-down stop", () => {
  const advice = stopAdvice();
  const stop = advice.stops[0] as PlannedStop;
  const proof = runHeatRun(route.profile, UTE_VAN, { stops: advice.stops.map((s) => ({ atM: s.atM, durationS: s.durationS })) });
  const asPlanned = runHeatRun(route.profile, UTE_VAN);

  it("is advised because the descent reaches the hot line as planned", () => {
    expect(isBelow(outcomeOf(asPlanned, descent.startDistanceM, descent.endDistanceM), "hot")).toBe(false);
    expect(advice.line).toBe("hot");
    expect(advice.stops).toHaveLength(1);
  });

  it("comes before the point where the hot line would be crossed", () => {
    const k = firstCrossing(asPlanned, descent.startDistanceM, descent.endDistanceM, "hot");
    expect(stop.atM).toBeLessThan(asPlanned.trace.distanceM[k]!);
    expect(stop.atM).toBeGreaterThanOrEqual(descent.startDistanceM - 500);
  });

  it("without waypoints, is made on the bench, where the road is no steeper than 4 % over the parking stretch", () => {
    const unnamed = stopAdvice([]).stops[0]!;
    expect(unnamed.place.kind).toBe("flat");
    expect(unnamed.atM).toBeGreaterThanOrEqual(4000);
    expect(unnamed.atM).toBeLessThanOrEqual(4300);
    expect(Math.abs(gradeAround(route.profile, unnamed.atM))).toBeLessThanOrEqual(maxStopGrade + 1e-9);
    if (unnamed.place.kind === "flat") expect(unnamed.place.grade).toBeCloseTo(gradeAround(route.profile, unnamed.atM), 9);
  });

  it("uses a named waypoint within a few hundred metres of the chosen place, and keeps its name", () => {
    expect(stop.place).toEqual({ kind: "waypoint", name: "Saddle Bay" });
    expect(stop.atM).toBe(3900);
    const unnamed = stopAdvice([]).stops[0]!;
    expect(Math.abs(unnamed.atM - 3900)).toBeLessThanOrEqual(400); // the waypoint was within the snap distance
    const far = stopAdvice([waypointAt("Far Gate", 3700)]).stops[0]!;
    expect(far.place.kind).toBe("flat"); // more than 400 m from the chosen place: not used
    expect(far.atM).toBe(unnamed.atM);
  });

  it("is not advised on a steady 10 % descent, where the only place to stand is the crest and the brakes are cold there", () => {
    const steady = oneDescent(-0.1, 2100);
    const a = adviseRig({ route: steady.profile, descents: steady.descents, rig: UTE_VAN }).descents[0]!;
    expect(a.stop).not.toBeNull();
    expect(a.stop!.stops).toEqual([]);
    expect(a.plan.stops).toEqual([]);
  });

  it("lasts no longer than the standstill cooling model needs to bring every brake to its target, in whole minutes, at least 5", () => {
    const k = nearestIndex(proof.trace.distanceM, stop.atM);
    const arrival = proof.trace.rotorC.map((c) => c[k]!);
    arrival.forEach((t, j) => expect(t).toBeCloseTo(stop.arrivalC[j]!, 6));
    const targets = stopTargets(proof.model, 50);
    expect(targets).toEqual([200, 150, 150]); // warm lines 250 / 200 / 200 °C minus 50 K
    const need = standstillTimeToReach({ rotorC: arrival, fluidC: arrival.map(() => NaN) }, proof.positions, targets, 25).durationS;
    expect(stop.modelTimeS).toBeCloseTo(need, 6);
    expect(stop.capped).toBe(false);
    expect(stop.durationS).toBeLessThanOrEqual(Math.max(minStopS, Math.ceil(need / 60) * 60));
    expect(stop.durationS).toBeGreaterThanOrEqual(minStopS);
    expect(stop.durationS).toBeLessThanOrEqual(maxStopS);
    expect(stop.durationS % 60).toBe(0);
  });

  it("is the shortest 5-minute step that keeps the descent below the line: 5 minutes less is not enough", () => {
    const o = outcomeOf(proof, descent.startDistanceM, descent.endDistanceM);
    expect(isBelow(o, "hot")).toBe(true);
    if (stop.durationS - 300 >= minStopS) {
      const shorter = runHeatRun(route.profile, UTE_VAN, { stops: [{ atM: stop.atM, durationS: stop.durationS - 300 }] });
      expect(isBelow(outcomeOf(shorter, descent.startDistanceM, descent.endDistanceM), "hot")).toBe(false);
    } else {
      expect(stop.durationS).toBe(minStopS); // already the shortest stop the advice gives
    }
  });

  it("keeps every brake below the hot line in the re-run with the stop", () => {
    const o = outcomeOf(proof, descent.startDistanceM, descent.endDistanceM);
    expect(isBelow(o, "hot")).toBe(true);
    expect(advice.enough).toBe(true);
    expect(o.positions.map((p) => p.peakC)).toEqual(advice.outcome.positions.map((p) => p.peakC));
  });
});

describe("stop duration", () => {
  it("matches the analytic convection-only cooling law t = τ·ln((T0 − Ta)/(T1 − Ta)), τ = m·c/(f·hA_0)", () => {
    // emissivity 0: no radiation, so the standstill conductance is f·hA_0, constant (docs/model.md)
    const model = resolveModel(UTE_VAN, { emissivity: 0 });
    const front = model.positions[0]!;
    const tau = (front.massKg * front.specificHeat) / (front.standstillFactor * front.standstillConductanceWK);
    const analytic = tau * Math.log((300 - 25) / (200 - 25));
    const d = stopDuration(model, [300, 25, 25], [200, 150, 150], { minStopS: 300, maxStopS: 1e9 });
    expect(d.modelTimeS).toBeCloseTo(analytic, 3);
    expect(d.durationS).toBe(Math.ceil(analytic / 60) * 60);
    // [D] 10 kg × 460 J/(kg·K) / (0.85 × 1.25 × (0.32/0.33)²) W/K ≈ 4,608 s; × ln(275/175) ≈ 2,083 s
    expect(analytic).toBeCloseTo(2083, -1);
  });

  it("is at least 5 minutes and at most the longest stop (30 minutes), in whole minutes, and says when it was capped", () => {
    const model = resolveModel(UTE_VAN);
    expect([minStopS, maxStopS]).toEqual([300, 1800]); // 5 and 30 minutes
    expect(stopDuration(model, [205, 25, 25], [200, 150, 150], { minStopS, maxStopS }).durationS).toBe(300);
    const long = stopDuration(model, [600, 600, 600], [200, 150, 150], { minStopS, maxStopS });
    expect(long.modelTimeS).toBeGreaterThan(maxStopS);
    expect(long.durationS).toBe(1800);
    expect(long.capped).toBe(true);
    const odd = stopDuration(model, [600, 600, 600], [200, 150, 150], { minStopS, maxStopS: 1830 });
    expect(odd.durationS).toBe(1800); // whole minutes even when the longest stop is not
  });
});
