/**
 * Benchmarks of the uncertainty bands (lib/thermal/ensemble.ts): figures only, never asserted.
 * (a) a 12-rig convoy on the synthetic 300 km mountain route at 10 m steps (30,001 samples): each rig's
 *     nominal heat run and its band (members on the 50 m copy of the route): goal well under 300 ms (server).
 * (b) one rig's band recomputed with the nominal run already made (a what-if): goal ≤ 16 ms.
 * (c) the same 12 rigs' nominal heat runs alone, for comparison.
 * Run: `npx vitest bench --run --project unit tests/bench/band.bench.ts` (also part of `npm run bench`).
 */

import { bench, describe } from "vitest";
import { DEFAULT_BAND_SETTINGS, prepareRoute, runBand, runPrepared, UTE_AND_CARAVAN, validateRouteProfile } from "@/lib/thermal";
import { convoy12, mountainRoute300 } from "./advice-fixtures";

const { profile } = mountainRoute300();
const route = prepareRoute(validateRouteProfile(profile));
const members = convoy12();
const nominal = runPrepared(route, UTE_AND_CARAVAN, {});
console.log(
  `band bench: route ${route.n} samples at ${profile.stepM} m; ${DEFAULT_BAND_SETTINGS.members} members per rig at ` +
    `${DEFAULT_BAND_SETTINGS.stepM} m; goals: (a) convoy well under 300 ms, (b) one rig ≤ 16 ms (see "mean", ms).`,
);

describe("bands, 300 km at 10 m", () => {
  bench(
    "(a) 12-rig convoy: nominal heat runs + bands (goal well under 300 ms)",
    () => {
      for (const m of members) runBand(route, m.rig);
    },
    { iterations: 10, time: 0, warmupIterations: 2, warmupTime: 0 },
  );
  bench("(b) one rig's band, nominal run given (goal ≤ 16 ms)", () => {
    runBand(route, UTE_AND_CARAVAN, {}, {}, nominal);
  });
  bench(
    "(c) 12-rig convoy: nominal heat runs only",
    () => {
      for (const m of members) runPrepared(route, m.rig, {});
    },
    { iterations: 10, time: 0, warmupIterations: 2, warmupTime: 0 },
  );
});
