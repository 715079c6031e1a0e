/**
 * Structured advice for a rig on a route. Numbers in SI (m, s, m/s), temperatures in °C. Every
 * piece of advice carries the result of re-running the model with it applied.
 */

import type { Descent, PlacedWaypoint } from "@/lib/route";
import type { HotColdStop } from "@/lib/stopping";
import type { BrakePosition, CoolDownStop, StepClass, ThermalState, TrailerBrakeType } from "@/lib/thermal";

/** A line a re-run must stay below: warm (caution) or hot (fade likely); both include fluid boil risk. */
export type AdviceLine = "warm" | "hot";

/** One brake position over a descent in one run. */
export interface PositionOutcome {
  /** Position. */
  position: BrakePosition;
  /** Peak bulk temperature on the descent, °C. */
  peakC: number;
  /** Where the peak occurs, m along the route. */
  peakAtM: number;
  /** Temperature at the bottom of the descent, °C. */
  endC: number;
  /** Warm (caution) and hot (fade-likely) lines of this brake, °C (estimates). */
  warmC: number;
  hotC: number;
  /** Validity ceiling of this brake, °C: a peak at or past it is shown as "beyond Fadeline's range". */
  ceilingC: number;
  /** Driving time at or above the warm line, s (time standing at a stop not counted). */
  timeWarmOrAboveS: number;
  /** Peak fluid proxy, °C (unvalidated), null without hydraulic fluid; and its estimated boiling point. */
  peakFluidC: number | null;
  boilC: number | null;
}

/** The result of one run over a descent. */
export interface RunOutcome {
  /** Per position, in the rig's position order (front, rear, trailer). */
  positions: PositionOutcome[];
  /** Worst step class on the descent. */
  worstClass: StepClass;
  /** Smallest margin to the warm line over the positions (fluid: to its boiling point), K; > 0 = below. */
  marginToWarmK: number;
  /** Smallest margin to the hot line (fluid: to its boiling point), K; > 0 = below. */
  marginToHotK: number;
  /** Model step of the run, m (the route's step, or the coarser search step). */
  stepM: number;
}

/** A driving plan on one descent: the re-run applies it from the crest to the bottom. */
export interface DrivePlan {
  /** Gear held from the crest, 1-based (converter locked on an automatic: manual mode). */
  gear?: number;
  /** Held-speed cap, m/s. */
  speedMs?: number;
  /** Cool-down stops. */
  stops?: readonly CoolDownStop[];
  /** Trailer controller gain for the re-run (dimensionless). */
  trailerGain?: number;
}

/** Gear advice: the highest gear that keeps every brake below the warm line at the held speed. */
export interface GearAdvice {
  /** The gear, 1-based; null when no gear is enough. */
  gear: number | null;
  /** Highest speed in that gear at the descent rpm limit, m/s (null without a gear). */
  gearLimitMs: number | null;
  /** Fastest speed held on the descent in that gear (the lower of the speed policy and the gear limit), m/s. */
  heldTopMs: number | null;
  /** The descent rpm limit, rev/min. */
  maxRpm: number;
  /** True for an automatic: hold the gear in manual mode (converter locked). */
  manualMode: boolean;
  /** Re-run with the gear held, or with 1st held when no gear is enough. */
  outcome: RunOutcome;
}

/** Speed advice: the highest steady speed (multiple of 5 km/h) that keeps every brake below the warm line. */
export interface SpeedAdvice {
  /** The speed, m/s; null when no speed down to walking pace is enough. */
  speedMs: number | null;
  /** The gear held with it, 1-based: the lowest that reaches the speed within the rpm limit (1st at walking pace). */
  gear: number;
  /** Where the gear comes from: advised with the speed (not left to the gearbox). */
  gearSource: "advised";
  /** True for an automatic: hold the gear in manual mode (converter locked). */
  manualMode: boolean;
  /** Re-run at that speed in that gear (walking pace in 1st when no speed is enough). */
  outcome: RunOutcome;
}

/** How a stop place was chosen. */
export type StopPlace =
  | { kind: "waypoint"; name: string }
  | { kind: "crest" }
  | { kind: "flat"; grade: number };

/** One planned cool-down stop. */
export interface PlannedStop extends CoolDownStop {
  /** Where, in words. */
  place: StopPlace;
  /** Brake temperatures on arriving at the stop (after slowing for it), °C. */
  arrivalC: number[];
  /** Target temperature per position, °C. */
  targetC: number[];
  /** Standstill time the cooling model needs to reach the targets, s (before rounding up). */
  modelTimeS: number;
  /** Whether the duration was capped (the cooling model asks for more than the longest stop we suggest). */
  capped: boolean;
}

/** Cool-down stop advice. */
export interface StopAdvice {
  /** The line the stops keep the brakes below. */
  line: AdviceLine;
  /** The stops, in route order (empty when no useful place was found). */
  stops: PlannedStop[];
  /** Re-run with the stops. */
  outcome: RunOutcome;
  /** Whether the re-run stays below the line. */
  enough: boolean;
}

/** Trailer-brake advice codes (rendered in words by render.ts). */
export type TrailerNote =
  | "electric-not-on-engine-braking"
  | "check-raise-gain"
  | "check-trailer-brakes"
  | "trailer-fades"
  | "gain-trade-off"
  | "override-drags-under-engine-braking"
  | "override-ease-off"
  | "unbraked-trailer";

/** Trailer-brake advice. */
export interface TrailerAdvice {
  /** Brake type. */
  brakeType: TrailerBrakeType;
  /** Controller gain used (dimensionless). */
  gain: number;
  /** Trailer share of the friction heat on the descent, and what it would be with an ideal controller. */
  trailerHeatShare: number;
  idealHeatShare: number;
  /** Notes, in order. */
  notes: TrailerNote[];
  /** Re-run with the gain at 1.0 (when a gain check is advised and the gain is below 1), else null. */
  gainOneOutcome: RunOutcome | null;
}

/** Where a descent's combined plan keeps the brakes in the proof: below warm, below hot, or not below hot. */
export type PlanStatus = "below-warm" | "below-hot" | "above-hot";

/** The combined plan for one descent. */
export interface CombinedPlan {
  /** The plan (gear, speed, stops). */
  plan: DrivePlan;
  /** Its cool-down stops in detail (place, arrival and target temperatures). */
  stops: PlannedStop[];
  /** Below which line the proof keeps the brakes (fluid below boil risk included). */
  status: PlanStatus;
  /** The plan's re-run on the descent, from the whole-route proof. */
  outcome: RunOutcome;
}

/** What would change a plan that is not enough (rendered in words by render.ts). */
export type ShortfallRemedy = "less-load" | "raise-trailer-gain" | "fresh-fluid" | "brake-upgrade" | "another-route";

/** Why a descent's plan is not enough: the brake furthest past its line, by how much, and what would change it. */
export interface Shortfall {
  /** The brake position, and whether it has discs or drums. */
  position: BrakePosition;
  brake: "disc" | "drum";
  /**
   * The line it passes: the fade-likely (hot) line, the fluid's estimated boiling point (boil), or the
   * model's validity ceiling (runaway: the brakes may fail).
   */
  line: "hot" | "boil" | "runaway";
  /** Its peak on the descent in the plan's proven re-run (the fluid proxy for boil), °C. */
  peakC: number;
  /** The line, °C (NaN for a runaway without a temperature past the ceiling: the brakes no longer hold the speed). */
  lineC: number;
  /** Where the peak is, m along the route. */
  atM: number;
  /** What would change it, in order. */
  remedies: ShortfallRemedy[];
}

/** Advice for one descent where the rig reaches warm or worse. */
export interface DescentAdvice {
  /** Index into the route's descents. */
  descentIndex: number;
  /** Number of high-range gears: gears above it are low range (lib/thermal gearName). */
  highRangeGears: number;
  /** The descent (from lib/route). */
  descent: Descent;
  /** Brake state at the crest with the earlier descents' plans applied (what the advice starts from), °C. */
  crestState: ThermalState;
  /** The descent as planned: the heat run with no advice anywhere on the route. */
  baseline: RunOutcome;
  gear: GearAdvice;
  speed: SpeedAdvice;
  /** Cool-down stops, when the descent reaches the hot line or fluid boil risk as planned; else null. */
  stop: StopAdvice | null;
  /** Trailer brakes, when towing. */
  trailer: TrailerAdvice | null;
  /**
   * No gear (held), speed step (in its gear, held) or cool-down stops keep every brake below hot and the fluid
   * below boil risk (the internal flag; the words come from `shortfall`).
   */
  nothingIsEnough: boolean;
  /** Why the proven plan is not enough (it leaves a brake at or past hot, boil risk or runaway), else null. */
  shortfall: Shortfall | null;
  /** The walking-pace re-run. */
  walkingPace: RunOutcome;
  /** Best combination, proven in the whole-route run. */
  plan: CombinedPlan;
  /** Each position's band as planned and with the plan, once bands are run (withBands). */
  bands?: { asPlanned: BandEdges[]; withAdvice: BandEdges[] };
  /** Stopping distance at the bottom: as planned, and with the combined plan. */
  stopping: { asPlanned: HotColdStop[]; withPlan: HotColdStop[] };
}

/** A band edge pair, °C (10th and 90th percentile of the ensemble; lib/thermal runBand). */
export interface BandEdges {
  lowC: number;
  highC: number;
}

/** A descent whose band straddles a line with the advice applied: "could reach fade on descent 2". */
export interface BandNote {
  /** Index into the route's descents. */
  descentIndex: number;
  /** The line the band's upper edge reaches while the nominal stays below it. */
  line: AdviceLine;
  /** Each brake that could reach it: its peak, its upper edge and its line, °C. */
  hits: { position: BrakePosition; peakC: number; highC: number; limitC: number }[];
}

/** Advice for one rig over a route. */
export interface RigAdvice {
  /** Descents that need advice (reach warm or worse), in route order. */
  descents: DescentAdvice[];
  /**
   * Every descent of the route with its class as planned and with all advice applied (the proof), and, once
   * bands are run (withBands), each position's band as planned and with the advice.
   */
  proof: {
    descentIndex: number;
    asPlanned: RunOutcome;
    withAdvice: RunOutcome;
    band?: { asPlanned: BandEdges[]; withAdvice: BandEdges[] };
  }[];
  /** Lines the bands straddle with the advice applied (empty before bands are run). */
  uncertainty: BandNote[];
  /** Worst class over the whole route as planned and with all advice applied. */
  worstClass: { asPlanned: StepClass; withAdvice: StepClass };
  /** Verdict for this rig (see convoy.ts for the rule). */
  verdict: Verdict;
  /** Mass ratings and trailer-brake rules the rig fails, in plain words; any makes the verdict "not advised". */
  legalReasons: string[];
  /** The waypoints the advice could name. */
  waypoints: readonly PlacedWaypoint[];
  /** Model version of every run. */
  modelVersion: string;
}

/** A verdict in our words. */
export type Verdict = "clear" | "clear with advice" | "not advised";
