/**
 * Benchmarks of lib/thermal: one rig over a 300 km route at 10 m steps (30,000 samples), and a
 * 12-rig convoy on the same route. Figures only, never asserted. Targets: 1 rig ≤ 16 ms (browser what-if),
 * 12 rigs ≤ 200 ms (server). Run: `npx vitest bench --run tests/bench/thermal.bench.ts`.
 */

import { bench, describe } from "vitest";
import {
  runConvoyHeatRuns,
  runHeatRun,
  summarizeDescents,
  UTE_AND_CARAVAN,
  WAGON_AND_CAMPER,
  type Rig,
} from "@/lib/thermal";
import { longMixedProfile } from "../unit/thermal/route-helpers";

const profile = longMixedProfile(300_000, 10);
const convoy: Rig[] = Array.from({ length: 12 }, (_, i) => {
  const base = i % 2 === 0 ? UTE_AND_CARAVAN : WAGON_AND_CAMPER;
  return { ...base, load: { ...base.load, vehiclePayloadKg: base.load.vehiclePayloadKg + 20 * i } };
});
const descents = Array.from({ length: 15 }, (_, i) => ({ startM: 20_000 * i + 11_000, endM: 20_000 * i + 17_000 }));

describe(`lib/thermal, 300 km at 10 m (${profile.distanceM.length} samples)`, () => {
  bench("1 rig heat run", () => {
    runHeatRun(profile, UTE_AND_CARAVAN);
  });
  bench("1 rig heat run + 15 descent summaries", () => {
    summarizeDescents(runHeatRun(profile, UTE_AND_CARAVAN), descents);
  });
  bench("12-rig convoy heat runs", () => {
    runConvoyHeatRuns(profile, convoy);
  });
});
