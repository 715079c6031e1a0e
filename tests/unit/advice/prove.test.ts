/**
 * The proof: the whole route re-run in one piece at its own step with every descent's combined
 * plan applied (proveAdvice, adviceOptions). Advice exists to cool the brakes, so on every advised descent the
 * re-run's peaks are at or below the peaks as planned; and the engine's own proof, built from pieces, agrees
 * with the one-piece re-run within a few kelvin. Checked with an independent runHeatRun.
 */

import { describe, expect, it } from "vitest";
import { adviceOptions, adviseRig, outcomeOf, proveAdvice } from "@/lib/advice";
import { prepareRoute, runHeatRun, validateRouteProfile } from "@/lib/thermal";
import { twoDescents, UTE_VAN, UTE_VAN_LOW_GAIN } from "./scenarios";

const route = twoDescents();

describe.each([
  { name: "ute and caravan", rig: UTE_VAN },
  { name: "ute and caravan, controller gain 0.5", rig: UTE_VAN_LOW_GAIN },
])("proveAdvice, $name", ({ rig }) => {
  const advice = adviseRig({ route: route.profile, descents: route.descents, rig });
  const proof = proveAdvice(route.profile, route.descents, rig, advice);

  it("advises both descents (both reach warm or worse as planned)", () => {
    expect(advice.descents.map((d) => d.descentIndex)).toEqual([0, 1]);
  });

  it("keeps every position at or below its as-planned peak on each advised descent", () => {
    for (const a of advice.descents) {
      const withAdvice = proof.descents[a.descentIndex]!;
      withAdvice.positions.forEach((p, j) => expect(p.peakC).toBeLessThanOrEqual(a.baseline.positions[j]!.peakC + 1e-9));
    }
  });

  it("is the same as an independent whole-route heat run with the advice as options", () => {
    const run = runHeatRun(route.profile, rig, adviceOptions(advice));
    route.descents.forEach((d, i) => {
      const own = outcomeOf(run, d.startDistanceM, d.endDistanceM);
      proof.descents[i]!.positions.forEach((p, j) => expect(p.peakC).toBeCloseTo(own.positions[j]!.peakC, 9));
    });
    expect(proof.result.trace.length).toBe(route.profile.distanceM.length); // the route's own step, one piece
  });

  it("agrees with the engine's proof (built from pieces) within 5 K on every descent", () => {
    advice.proof.forEach((p, i) => {
      p.withAdvice.positions.forEach((q, j) => expect(Math.abs(q.peakC - proof.descents[i]!.positions[j]!.peakC)).toBeLessThan(5));
      expect(p.withAdvice.worstClass).toBe(proof.descents[i]!.worstClass);
    });
  });

  it("turns each combined plan into a control from crest to bottom, keeping the plan's own options", () => {
    const base = { controls: [{ startM: 0, endM: 1000, speedMs: 20 }], stops: [{ atM: 500, durationS: 60 }] };
    const opts = adviceOptions(advice, base);
    expect(opts.controls![0]).toEqual(base.controls[0]);
    expect(opts.stops![0]).toEqual(base.stops[0]);
    for (const a of advice.descents) {
      const { gear, speedMs } = a.plan.plan;
      if (gear === undefined && speedMs === undefined) continue;
      const c = opts.controls!.find((x) => x.startM === a.descent.startDistanceM && x.endM === a.descent.endDistanceM);
      expect(c).toBeDefined();
      expect(c!.gear).toBe(gear);
      expect(c!.speedMs).toBe(speedMs);
    }
  });

  it("takes a prepared route as well as a profile", () => {
    const prepared = prepareRoute(validateRouteProfile(route.profile));
    const again = proveAdvice(prepared, route.descents, rig, advice);
    expect(again.descents).toEqual(proof.descents);
  });
});
