/**
 * Benchmarks of lib/advice: figures only, never asserted.
 * (a) a 12-rig convoy advised on a synthetic 300 km mountain route at 10 m steps (30,001 samples, six long
 *     descents), advice, proofs and verdict included: goal ≤ 300 ms (server).
 * (c) the same convoy as the plan page computes it: heat runs, advice and the uncertainty bands (with the
 *     second advice pass where a band reaches the fade line), through runPlanJob: goal ≤ 300 ms (server).
 * (b) a what-if for one rig on the same route: one runPrepared on the prepared route with one option changed
 *     (ambient temperature, or a held gear on one descent): goal ≤ 16 ms (browser, one frame).
 * Run: `npx vitest bench --run --project unit tests/bench/advice.bench.ts` (also part of `npm run bench`).
 * The descriptive lines (route, runs per convoy) are printed once when the file loads.
 */

import { bench, describe } from "vitest";
import { adviseConvoy } from "@/lib/advice";
import { runPlanJob } from "@/lib/analysis/plan-run";
import { RUN_COUNTS } from "@/lib/advice/descent-runner";
import { prepareRoute, runPrepared, UTE_AND_CARAVAN, validateRouteProfile } from "@/lib/thermal";
import { convoy12, mountainRoute300 } from "./advice-fixtures";

const { profile, descents } = mountainRoute300();
const route = prepareRoute(validateRouteProfile(profile));
const members = convoy12();

{
  const before = { ...RUN_COUNTS };
  const t0 = performance.now();
  const once = adviseConvoy({ route, descents, members });
  const ms = performance.now() - t0;
  const advised = once.rigs.reduce((n, r) => n + r.advice.descents.length, 0);
  console.log(
    [
      `advice bench: route ${profile.distanceM.length} samples at ${profile.stepM} m, ${descents.length} descents; 12 rigs.`,
      `  first convoy run (cold): ${ms.toFixed(0)} ms; verdict "${once.verdict}"; ${advised} rig-descents advised;`,
      `  descent re-runs per convoy: ${RUN_COUNTS.fine - before.fine} at the route's step, ${RUN_COUNTS.coarse - before.coarse} at the search step,`,
      `  ${RUN_COUNTS.prefix - before.prefix} runs up to a stop (arrival only).`,
      `  goals: (a) convoy ≤ 300 ms, (b) what-if ≤ 16 ms (see "mean" below, in ms).`,
    ].join("\n"),
  );
}

describe("lib/advice, 300 km at 10 m, 6 long descents", () => {
  bench(
    "(a) 12-rig convoy with advice (goal ≤ 300 ms)",
    () => {
      adviseConvoy({ route, descents, members });
    },
    { iterations: 5, time: 0, warmupIterations: 1, warmupTime: 0 },
  );
});

describe("plan job, 300 km at 10 m, 6 long descents", () => {
  const job = { kind: "plan" as const, profile, descents, waypoints: [], members: members.map((m) => ({ rig: m.rig, options: {} })) };
  bench(
    "(c) 12-rig convoy with advice and bands (goal ≤ 300 ms)",
    () => {
      runPlanJob(job);
    },
    { iterations: 3, time: 0, warmupIterations: 1, warmupTime: 0 },
  );
});

describe("what-if, one rig, 300 km at 10 m", () => {
  let ambient = 25;
  const d = descents[2]!;
  bench("(b) runPrepared, ambient changed (goal ≤ 16 ms)", () => {
    ambient = ambient >= 40 ? 25 : ambient + 1;
    runPrepared(route, UTE_AND_CARAVAN, { params: { ambientC: ambient } });
  });
  let gear = 1;
  bench("(b) runPrepared, gear held on one descent (goal ≤ 16 ms)", () => {
    gear = gear >= 3 ? 1 : gear + 1;
    runPrepared(route, UTE_AND_CARAVAN, { controls: [{ startM: d.startDistanceM, endM: d.endDistanceM, gear }] });
  });
});
