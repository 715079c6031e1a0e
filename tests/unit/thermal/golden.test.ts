/**
 * Golden fixtures: whole rig-plus-route runs, input in __fixtures__/in, expected output in __fixtures__/out.
 * Regenerate on purpose with `REGEN_FIXTURES=1 npx vitest run --project unit tests/unit/thermal/golden.test.ts`.
 */

import { readdirSync, readFileSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { runHeatRun, summarizeDescents, type CoolDownStop, type DescentRange, type ModelParamsInput, type Rig } from "@/lib/thermal";
import { stretchesProfile, type Stretch } from "./route-helpers";

interface FixtureIn {
  description: string;
  rig: Rig;
  route: { stepM: number; startElevationM: number; stretches: Stretch[] };
  params?: ModelParamsInput;
  stops?: CoolDownStop[];
  descents: DescentRange[];
  traceEvery: number;
}

const dir = join(__dirname, "__fixtures__");
const regenerate = process.env.REGEN_FIXTURES === "1";

/** Round to 6 significant digits so float noise cannot break the comparison; NaN becomes null. */
function round(value: unknown): unknown {
  if (typeof value === "number") return Number.isFinite(value) ? Number(value.toPrecision(6)) : null;
  if (Array.isArray(value)) return value.map(round);
  if (value && typeof value === "object") return Object.fromEntries(Object.entries(value).map(([k, v]) => [k, round(v)]));
  return value;
}

function run(input: FixtureIn): unknown {
  const profile = stretchesProfile(input.route.stretches, input.route.stepM, input.route.startElevationM);
  const result = runHeatRun(profile, input.rig, { params: input.params, stops: input.stops });
  const t = result.trace;
  const samples = [];
  for (let k = 0; k < t.length; k += input.traceEvery) {
    samples.push({
      distanceM: t.distanceM[k], elevationM: t.elevationM[k], timeS: t.timeS[k], speedMs: t.speedMs[k], gear: t.gear[k],
      rotorC: t.rotorC.map((c) => c[k]), fluidC: t.fluidC.map((c) => c[k]),
      brakePowerW: t.brakePowerW.map((c) => c[k]), worstClass: t.worstClass[k],
    });
  }
  return round({
    modelVersion: result.modelVersion,
    params: result.model.params,
    positions: result.positions,
    descents: summarizeDescents(result, input.descents),
    samples,
  });
}

describe("golden heat runs", () => {
  for (const file of readdirSync(join(dir, "in")).filter((f) => f.endsWith(".json"))) {
    it(file, () => {
      const input = JSON.parse(readFileSync(join(dir, "in", file), "utf8")) as FixtureIn;
      const actual = run(input);
      const outPath = join(dir, "out", file);
      if (regenerate) writeFileSync(outPath, `${JSON.stringify(actual, null, 1)}\n`);
      expect(actual).toEqual(JSON.parse(readFileSync(outPath, "utf8")));
    });
  }
});
