/** Per-descent summaries: peaks and where they occur, time above thresholds, margins. */

import { describe, expect, it } from "vitest";
import { runHeatRun, summarizeDescents, UTE_AND_CARAVAN } from "@/lib/thermal";
import { stretchesProfile } from "./route-helpers";

const profile = stretchesProfile([
  { lengthM: 2000, grade: 0 },
  { lengthM: 6000, grade: -0.09 },
  { lengthM: 4000, grade: 0 },
]);
const result = runHeatRun(profile, UTE_AND_CARAVAN);
const [descent, whole] = summarizeDescents(result, [{ startM: 2000, endM: 8000 }, { startM: 0, endM: 12_000 }]);

describe("summary of a descent", () => {
  it("peaks at the foot of the descent (within the last step, where the driver eases off), then cools", () => {
    for (const p of descent!.positions) {
      expect(p.peakAtM).toBeGreaterThanOrEqual(7990);
      expect(p.peakAtM).toBeLessThanOrEqual(8000);
    }
    expect(whole!.positions[0]!.endC).toBeLessThan(whole!.positions[0]!.peakC);
    expect(descent!.dropM).toBeCloseTo(540, 6);
  });

  it("margins are threshold minus peak (negative once exceeded)", () => {
    const f = descent!.positions[0]!;
    const spec = result.positions[0]!;
    expect(f.marginToWarmK).toBeCloseTo(spec.thresholds.warmC - f.peakC, 10);
    expect(f.marginToHotK).toBeCloseTo(spec.thresholds.hotC - f.peakC, 10);
    // FMVSS No. 116 DOT 4 minimums: 230 °C dry, 155 °C wet.
    expect(f.fluidMarginsK!.dry).toBeCloseTo(230 - f.peakFluidC!, 10);
    expect(f.fluidMarginsK!.wet).toBeCloseTo(155 - f.peakFluidC!, 10);
    expect(descent!.positions[2]!.peakFluidC).toBeNull();
  });

  it("time above a threshold adds the steps that end at or above it", () => {
    const col = result.trace.rotorC[0]!;
    const t = result.trace.timeS;
    let expected = 0;
    for (let k = 201; k <= 800; k++) if (col[k]! >= result.positions[0]!.thresholds.warmC) expected += t[k]! - t[k - 1]!;
    expect(descent!.positions[0]!.timeWarmOrAboveS).toBeCloseTo(expected, 9);
    expect(descent!.positions[0]!.timeHotOrAboveS).toBeLessThanOrEqual(descent!.positions[0]!.timeWarmOrAboveS);
  });

  it("names the worst class in our words", () => {
    expect(["cool", "warm", "hot", "boil-risk"]).toContain(descent!.worstClass);
    expect(descent!.worstClass).toBe("hot");
  });
});
