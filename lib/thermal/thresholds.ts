/**
 * Temperature thresholds and step classes. Friction-material thresholds are ESTIMATES: no standard defines
 * "fade onset" (docs/model.md §9.1; docs/trade-facts.md §4.3). Brake-fluid boiling points are the FMVSS No. 116
 * minimums (49 CFR 571.116 S5.1.1 dry, S5.1.2 wet; docs/model.md §8; docs/trade-facts.md §3.1).
 */

import type { FluidClass, PadFamily } from "./rig";

/** Step classes in our words, in rising order of concern. The trace stores their index. */
export const STEP_CLASSES = ["cool", "warm", "hot", "boil-risk", "runaway"] as const;

/** A step class. */
export type StepClass = (typeof STEP_CLASSES)[number];

/** Warm (caution) and hot (fade likely) bulk-temperature thresholds of a friction material, °C. */
export interface PadThresholds {
  /** Caution from here: use a lower gear, °C. */
  warmC: number;
  /** Fade likely from here: slow down or stop to cool, °C. */
  hotC: number;
}

/** Label on the pad thresholds. */
export const PAD_THRESHOLD_LABEL = "estimate: no standard defines fade onset; set your own";

/**
 * Default thresholds per friction family [E/M], docs/model.md §9.1: organic/NAO fine to ≈ 250 °C, fade from
 * ≈ 300–350 °C; OE ceramic-type fade likely from ≈ 350 °C; semi-metallic usable to ≈ 450–550 °C; drum linings
 * use the 260 °C (500 °F) bulk-drum limit of the FHWA grade severity rating system [M] as "hot".
 */
export const DEFAULT_PAD_THRESHOLDS: Readonly<Record<PadFamily, PadThresholds>> = {
  organic: { warmC: 250, hotC: 300 },
  ceramic: { warmC: 250, hotC: 350 },
  "semi-metallic": { warmC: 350, hotC: 450 },
  "drum-lining": { warmC: 200, hotC: 260 },
};

/** Minimum equilibrium reflux boiling points, dry and wet, °C. FMVSS No. 116 (49 CFR 571.116) S5.1.1, S5.1.2. */
export const FMVSS_116_BOILING_POINTS: Readonly<Record<FluidClass, { dryC: number; wetC: number }>> = {
  "DOT 3": { dryC: 205, wetC: 140 }, // [S] docs/model.md §8; docs/trade-facts.md §3.1
  "DOT 4": { dryC: 230, wetC: 155 }, // [S] same
  "DOT 5.1": { dryC: 260, wetC: 180 }, // [M] same limits as DOT 5 (docs/model.md §8)
  "DOT 5": { dryC: 260, wetC: 180 }, // [S] docs/model.md §8
};

/** Water content of the FMVSS No. 116 "wet" test fluid, % by weight. [S] docs/model.md §8 (3.70 ± 0.05 %). */
export const WET_TEST_WATER_PCT = 3.7;

/**
 * Water uptake of a glycol fluid, % by weight per year: "about 2 % in 12 months" [2nd] docs/trade-facts.md §3.2.
 * Common practice; the vehicle's schedule takes precedence.
 */
export const DEFAULT_WATER_UPTAKE_PCT_PER_YEAR = 2;

/**
 * Estimated water content of a glycol brake fluid, % by weight, capped at the wet-test content. Silicone DOT 5
 * is hydrophobic and gets 0.
 * @param fluidClass fluid class
 * @param yearsSinceChange years since the fluid was changed, years
 * @param uptakePctPerYear water uptake, %/year
 * @returns water content, % by weight
 * @example fluidWaterContentPct("DOT 4", 1, 2) // 2
 */
export function fluidWaterContentPct(fluidClass: FluidClass, yearsSinceChange: number, uptakePctPerYear: number): number {
  if (fluidClass === "DOT 5") return 0;
  const pct = uptakePctPerYear * yearsSinceChange;
  return pct > WET_TEST_WATER_PCT ? WET_TEST_WATER_PCT : pct;
}

/**
 * Estimated boiling point for the fluid's age [E]: linear in water content between the dry and the wet
 * FMVSS No. 116 minimums. Real fluids lose boiling point fastest at first, so this is optimistic for young
 * fluid; it reaches the wet minimum at 3.7 % water (≈ 1.85 years at 2 %/year).
 * @param fluidClass fluid class
 * @param yearsSinceChange years since the fluid was changed, years
 * @param uptakePctPerYear water uptake, %/year
 * @returns estimated boiling point, °C
 * @example fluidBoilingPointC("DOT 4", 2, 2) // 155
 */
export function fluidBoilingPointC(fluidClass: FluidClass, yearsSinceChange: number, uptakePctPerYear: number): number {
  const { dryC, wetC } = FMVSS_116_BOILING_POINTS[fluidClass];
  const w = fluidWaterContentPct(fluidClass, yearsSinceChange, uptakePctPerYear) / WET_TEST_WATER_PCT;
  return dryC - (dryC - wetC) * w;
}

/**
 * Validity ceilings of the bulk temperature per brake kind, °C: past these a lumped bulk temperature no
 * longer describes a working brake (docs/model.md, "Validity ceiling"), so the step is `runaway`.
 * - Discs 600 °C: light-truck brake dynamometer tests run to about 600 °C (common practice, no published
 *   source); a brake past that is outside any tested range.
 * - Drums 590 °C: below the 677 °C (1,250 °F) "cherry red, danger of runaway from drum expansion" line and
 *   at the 593 °C (1,100 °F) "oxidation" line of a reproduced heavy-truck brake lining temperature chart
 *   (industry chart, low authority; the chart reads at the lining interface, which runs hotter than bulk).
 */
export const DEFAULT_VALIDITY_CEILINGS_C: Readonly<Record<"disc" | "drum", number>> = { disc: 600, drum: 590 };

/**
 * Class of one brake at one sample: runaway past the validity ceiling, else boil-risk when the fluid proxy
 * reaches the estimated boiling point, else hot / warm / cool by the friction-material thresholds.
 * @param rotorC bulk rotor or drum temperature, °C
 * @param fluidC fluid proxy temperature, °C (NaN where there is no hydraulic fluid)
 * @param warmC warm threshold, °C
 * @param hotC hot threshold, °C
 * @param boilC estimated fluid boiling point, °C
 * @param ceilingC validity ceiling, °C (default: none)
 * @returns index into {@link STEP_CLASSES}
 * @example classifyBrake(320, 120, 250, 300, 155) // 2 ("hot")
 */
export function classifyBrake(
  rotorC: number,
  fluidC: number,
  warmC: number,
  hotC: number,
  boilC: number,
  ceilingC = Infinity,
): number {
  if (rotorC >= ceilingC) return 4;
  if (fluidC >= boilC) return 3;
  if (rotorC >= hotC) return 2;
  if (rotorC >= warmC) return 1;
  return 0;
}
