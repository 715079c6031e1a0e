/**
 * Per-descent summaries of a heat run: peak temperature per position and where it occurs, time above each
 * threshold, margins, and an energy account whose parts sum to the whole:
 *   potential + kinetic + drive = aero + rolling + engine + Σ brake (per step, so over any range).
 */

import type { HeatRunResult } from "./heat-run";
import { requireFinite, requireObject } from "./guards";
import type { BrakePosition } from "./resolve";
import { timeToCoolAtStandstillS } from "./standstill";
import { STEP_CLASSES, type StepClass } from "./thresholds";

/** A stretch of the route to summarise, m along the route. */
export interface DescentRange {
  /** Start, m. */
  startM: number;
  /** End, m. */
  endM: number;
}

/** Energy account of a range, J (whole combination). */
export interface EnergyAccount {
  /** Potential energy released, J. */
  potentialJ: number;
  /** Kinetic energy released (start minus end), J. */
  kineticJ: number;
  /** Traction work from the engine (throttle), J. */
  driveJ: number;
  /** Aerodynamic work, J. */
  aeroJ: number;
  /** Rolling-resistance work, J. */
  rollingJ: number;
  /** Engine-braking work, J. */
  engineJ: number;
  /** Friction work per position (all wheels at it), J; 0 for a position the rig lacks. */
  brakeJ: Record<BrakePosition, number>;
  /** potential + kinetic + drive, J. */
  inJ: number;
  /** aero + rolling + engine + brakes, J. */
  outJ: number;
}

/** One position over a range. */
export interface PositionSummary {
  /** Position. */
  position: BrakePosition;
  /** Peak bulk temperature, °C. */
  peakC: number;
  /** Where the peak occurs, m along the route. */
  peakAtM: number;
  /** Temperature at the end of the range, °C. */
  endC: number;
  /** Warm threshold minus peak, K (negative: exceeded). */
  marginToWarmK: number;
  /** Hot threshold minus peak, K (negative: exceeded). */
  marginToHotK: number;
  /** Time at or above the warm threshold, s. */
  timeWarmOrAboveS: number;
  /** Time at or above the hot threshold, s. */
  timeHotOrAboveS: number;
  /** Time with the fluid proxy at or above its estimated boiling point, s. */
  timeBoilRiskS: number;
  /** Peak fluid proxy, °C (unvalidated), or null without hydraulic fluid. */
  peakFluidC: number | null;
  /** Boiling point minus peak fluid proxy (dry, wet, estimated for age), K; null without fluid. */
  fluidMarginsK: { dry: number; wet: number; estimated: number } | null;
  /** Highest friction power at one wheel, W. */
  maxBrakePowerW: number;
}

/** Summary of one range. */
export interface DescentSummary {
  /** Start as asked, m. */
  startM: number;
  /** End as asked, m. */
  endM: number;
  /** Height lost from the first to the last sample in range, m. */
  dropM: number;
  /** Driving plus stopped time, s. */
  durationS: number;
  /** Worst step class in the range. */
  worstClass: StepClass;
  /** Per position, in the result's position order. */
  positions: PositionSummary[];
  /** Energy account. */
  energy: EnergyAccount;
}

/**
 * Summarise a heat run over given ranges (e.g. the descents lib/route found).
 * @param result a heat-run result
 * @param ranges ranges along the route, m
 * @returns one summary per range
 * @throws {RangeError} "ranges[0].endM must be greater than ranges[0].startM", or a range with no step
 * @example summarizeDescents(result, [{ startM: 12000, endM: 20000 }])[0].positions[0].peakC
 */
export function summarizeDescents(result: HeatRunResult, ranges: readonly DescentRange[]): DescentSummary[] {
  return ranges.map((range, r) => {
    const o = requireObject(range, `ranges[${r}]`);
    const startM = requireFinite(o.startM, `ranges[${r}].startM`);
    const endM = requireFinite(o.endM, `ranges[${r}].endM`);
    if (endM <= startM) throw new RangeError(`ranges[${r}].endM must be greater than ranges[${r}].startM`);
    const [a, b] = sampleRange(result.trace.distanceM, startM, endM);
    if (b <= a) throw new RangeError(`ranges[${r}] must cover at least one step of the route`);
    return summarizeRange(result, startM, endM, a, b);
  });
}

/** @private First sample at or after startM and last at or before endM. */
function sampleRange(d: Float64Array, startM: number, endM: number): [number, number] {
  let a = 0;
  while (a < d.length && (d[a] as number) < startM) a++;
  let b = d.length - 1;
  while (b >= 0 && (d[b] as number) > endM) b--;
  return [a, b];
}

/** @private */
function summarizeRange(result: HeatRunResult, startM: number, endM: number, a: number, b: number): DescentSummary {
  const { trace, positions } = result;
  const E = trace.energy;
  const sum = (col: Float64Array): number => {
    let s = 0;
    for (let k = a + 1; k <= b; k++) s += col[k] as number;
    return s;
  };
  const brakeJ: Record<BrakePosition, number> = { front: 0, rear: 0, trailer: 0 };
  positions.forEach((p, j) => (brakeJ[p.position] = sum(E.brakeJ[j] as Float64Array)));
  const energy = {
    potentialJ: sum(E.potentialJ),
    kineticJ: sum(E.kineticJ),
    driveJ: sum(E.driveJ),
    aeroJ: sum(E.aeroJ),
    rollingJ: sum(E.rollingJ),
    engineJ: sum(E.engineJ),
    brakeJ,
  };
  let worst = 0;
  for (let k = a; k <= b; k++) if ((trace.worstClass[k] as number) > worst) worst = trace.worstClass[k] as number;
  return {
    startM,
    endM,
    dropM: (trace.elevationM[a] as number) - (trace.elevationM[b] as number),
    durationS: (trace.timeS[b] as number) - (trace.timeS[a] as number),
    worstClass: STEP_CLASSES[worst] ?? "cool",
    positions: positions.map((_, j) => summarizePosition(result, j, a, b)),
    energy: {
      ...energy,
      inJ: energy.potentialJ + energy.kineticJ + energy.driveJ,
      outJ: energy.aeroJ + energy.rollingJ + energy.engineJ + brakeJ.front + brakeJ.rear + brakeJ.trailer,
    },
  };
}

/** @private */
function summarizePosition(result: HeatRunResult, j: number, a: number, b: number): PositionSummary {
  const { trace } = result;
  const spec = result.positions[j]!;
  const ambientC = result.model.params.ambientC;
  const rotor = trace.rotorC[j] as Float64Array;
  const fluid = trace.fluidC[j] as Float64Array;
  const power = trace.brakePowerW[j] as Float64Array;
  const { warmC, hotC } = spec.thresholds;
  const boilC = spec.fluid ? spec.fluid.boilC : Infinity;
  let peak = -Infinity, peakAt = a, peakFluid = -Infinity, maxPower = 0, warmS = 0, hotS = 0, boilS = 0;
  for (let k = a; k <= b; k++) {
    const t = rotor[k] as number;
    if (t > peak) (peak = t), (peakAt = k);
    if ((fluid[k] as number) > peakFluid) peakFluid = fluid[k] as number;
    if ((power[k] as number) > maxPower && k > a) maxPower = power[k] as number;
    if (k > a) {
      const dt = (trace.timeS[k] as number) - (trace.timeS[k - 1] as number) - (trace.stopS[k - 1] as number);
      if (t >= warmC) warmS += dt;
      if (t >= hotC) hotS += dt;
      if ((fluid[k] as number) >= boilC) boilS += dt;
    }
    const stop = trace.stopS[k] as number;
    if (stop > 0 && k < b) {
      warmS += Math.min(stop, timeToCoolAtStandstillS(spec, t, warmC, ambientC));
      hotS += Math.min(stop, timeToCoolAtStandstillS(spec, t, hotC, ambientC));
      if ((fluid[k] as number) >= boilC || (fluid[k + 1] as number) >= boilC) boilS += stop;
    }
  }
  const hasFluid = spec.fluid !== null;
  return {
    position: spec.position,
    peakC: peak,
    peakAtM: trace.distanceM[peakAt] as number,
    endC: rotor[b] as number,
    marginToWarmK: warmC - peak,
    marginToHotK: hotC - peak,
    timeWarmOrAboveS: warmS,
    timeHotOrAboveS: hotS,
    timeBoilRiskS: boilS,
    peakFluidC: hasFluid ? peakFluid : null,
    fluidMarginsK: spec.fluid
      ? { dry: spec.fluid.dryC - peakFluid, wet: spec.fluid.wetC - peakFluid, estimated: spec.fluid.boilC - peakFluid }
      : null,
    maxBrakePowerW: maxPower,
  };
}
