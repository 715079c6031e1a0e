/**
 * Cool-down stops: placed before the brakes would cross the fade (hot) line, named after a waypoint within a
 * few hundred metres, lasting what the standstill cooling model needs (lib/thermal standstillTimeToReach),
 * rounded up to whole minutes (at least 5), and proven by a full re-run with HeatRunOptions.stops. Sources:
 * issue 5 §4; the cooling law is thermal-model.md §1.4–1.5 (exact exponential for convection only).
 */

import { describe, expect, it } from "vitest";
import { adviseRig, isBelow, outcomeOf, stopDuration, stopTargets, type PlannedStop } from "@/lib/advice";
import { firstCrossing, nearestIndex } from "@/lib/advice/stop-place";
import { resolveModel, runHeatRun, standstillTimeToReach } from "@/lib/thermal";
import { oneDescent, UTE_VAN, waypointAt } from "./scenarios";

const route = oneDescent(-0.1, 2000); // crest at 3.0 km, bottom at 5.0 km
const { descent } = route;

function stopAdvice(waypoints = [waypointAt("Saddle Bay", 4200)]) {
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

  it("uses a named waypoint within a few hundred metres of the chosen place", () => {
    expect(stop.place).toEqual({ kind: "waypoint", name: "Saddle Bay" });
    expect(stop.atM).toBe(4200);
    const unnamed = stopAdvice([]).stops[0]!;
    expect(unnamed.place.kind).toBe("flat");
    expect(Math.abs(unnamed.atM - 4200)).toBeLessThanOrEqual(400); // the waypoint was within the snap distance
    const far = stopAdvice([waypointAt("Far Gate", 3100)]).stops[0]!;
    expect(far.place.kind).toBe("flat"); // more than 400 m from the chosen place: not used
  });

  it("lasts what the standstill cooling model needs from the arrival state, in whole minutes, at least 5", () => {
    const k = nearestIndex(proof.trace.distanceM, stop.atM);
    const arrival = proof.trace.rotorC.map((c) => c[k]!);
    arrival.forEach((t, j) => expect(t).toBeCloseTo(stop.arrivalC[j]!, 6));
    const targets = stopTargets(proof.model, 50);
    expect(targets).toEqual([200, 150, 150]); // warm lines 250 / 200 / 200 °C minus 50 K
    const need = standstillTimeToReach({ rotorC: arrival, fluidC: arrival.map(() => NaN) }, proof.positions, targets, 25).durationS;
    expect(stop.modelTimeS).toBeCloseTo(need, 6);
    expect(stop.durationS).toBe(Math.max(300, Math.ceil(need / 60) * 60));
    expect(stop.durationS % 60).toBe(0);
  });

  it("brings every brake to its target by the end of the stop (re-run with the stop)", () => {
    const k = nearestIndex(proof.trace.distanceM, stop.atM);
    const after = proof.trace.rotorC.map((c) => c[k + 1]!); // one 10 m step later, moving off again
    after.forEach((t, j) => expect(t).toBeLessThan(stop.targetC[j]! + 5));
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
    // emissivity 0: no radiation, so the standstill conductance is f·hA_0, constant (thermal-model.md §1.5)
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

  it("is at least 5 minutes and at most the longest stop, and says when it was capped", () => {
    const model = resolveModel(UTE_VAN);
    expect(stopDuration(model, [205, 25, 25], [200, 150, 150], { minStopS: 300, maxStopS: 3600 }).durationS).toBe(300);
    const long = stopDuration(model, [600, 600, 600], [200, 150, 150], { minStopS: 300, maxStopS: 3600 });
    expect(long.durationS).toBe(3600);
    expect(long.capped).toBe(true);
  });
});
