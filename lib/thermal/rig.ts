/**
 * Rig data types: a tow vehicle, an optional trailer or caravan, and the load. Plain data, SI units:
 * masses in kg, lengths in m, volumes in m³, speeds in m/s. These are the shapes the app's forms, the CLI JSON
 * and the brake-heat model share; the app's zod layer validates user input into them.
 */

/** Which definition the vehicle's empty mass follows (docs/trade-facts.md §1.2). */
export type EmptyMassDefinition =
  /** AU tare: all fluids, 10 L of fuel, no occupants or load. */
  | "tare"
  /** Kerb: tare plus a full fuel tank, no occupants or load. */
  | "kerb"
  /** EU mass in running order: ≥ 90 % fuel and the driver included. */
  | "running-order";

/** Brake hardware at one wheel position. */
export type BrakeKind = "vented-disc" | "solid-disc" | "drum";

/** Friction-material family; selects the warm/hot thresholds (estimates, docs/model.md §9.1). */
export type PadFamily = "organic" | "ceramic" | "semi-metallic" | "drum-lining";

/** Brake-fluid class (FMVSS No. 116 grades). */
export type FluidClass = "DOT 3" | "DOT 4" | "DOT 5.1" | "DOT 5";

/** Engine fuel. */
export type FuelType = "diesel" | "petrol";

/** How the engine retards on overrun: plain motoring friction, or with an exhaust brake / VGT braking mode. */
export type EngineBrakeMode = "motoring" | "exhaust-brake";

/** Transmission type. */
export type TransmissionKind = "manual" | "automatic";

/** Trailer service-brake type. */
export type TrailerBrakeType = "none" | "override" | "electric" | "electric-over-hydraulic";

/** Breakaway system fitted to the trailer. */
export type BreakawayKind = "none" | "electric" | "cable";

/** Body class of the tow vehicle; selects class defaults for drag area and rolling resistance. */
export type BodyClass = "ute" | "wagon";

/** Brakes at one wheel (one of two on an axle). */
export interface WheelBrake {
  /** Vented disc, solid disc or drum. */
  kind: BrakeKind;
  /** Outer diameter of the rotor or drum, m. */
  diameterM: number;
  /** Mass of one rotor or drum, kg. */
  massKg: number;
  /** Friction material; defaults to the vehicle's pad family (discs) or "drum-lining" (drums). */
  padFamily?: PadFamily;
}

/** Brake fluid in a hydraulic system. */
export interface BrakeFluid {
  /** Fluid class. */
  fluidClass: FluidClass;
  /** Years since the fluid was last changed, years (≥ 0). */
  yearsSinceChange: number;
}

/** The engine as far as engine braking needs it. */
export interface Engine {
  /** Swept volume, m³ (2.8 L = 0.0028 m³). */
  displacementM3: number;
  /** Diesel or petrol. */
  fuel: FuelType;
  /** Engine-braking mode on descents. */
  brakeMode: EngineBrakeMode;
  /** Highest rpm the driver accepts on a descent, rev/min; defaults by fuel (diesel 3,800, petrol 4,500). */
  maxRpm?: number;
  /** Idle speed, rev/min (below it the clutch or converter decouples); default 800. */
  idleRpm?: number;
}

/** Gear ratios of a transmission. */
export interface Transmission {
  /** Manual or automatic. */
  kind: TransmissionKind;
  /** Ratio of each gear, lowest gear (largest ratio) first (dimensionless). */
  gearRatios: readonly number[];
  /** Final-drive (axle) ratio (dimensionless). */
  finalDrive: number;
  /**
   * Automatic only: true when the driver holds a gear in manual mode with the converter locked. An automatic
   * with the converter unlocked retards far less (docs/model.md §3). Default false.
   */
  converterLocked?: boolean;
  /**
   * Low-range ratio of a 4WD's transfer case (dimensionless, > 1; about 2.5–2.7:1 is common, from memory).
   * Absent: no low range. Low range multiplies every gear's ratio; advice may then say "low range, 2nd".
   */
  lowRangeRatio?: number;
}

/** A reference to one of the generic transmissions in presets.ts. */
export interface TransmissionPresetRef {
  /** Identifier of a generic transmission preset. */
  preset: "generic-6-speed-automatic" | "generic-6-speed-manual";
  /** As {@link Transmission.converterLocked}. */
  converterLocked?: boolean;
  /** As {@link Transmission.lowRangeRatio}. */
  lowRangeRatio?: number;
}

/** The tow vehicle. */
export interface TowVehicle {
  /** Display name (the user's own words). */
  name: string;
  /** Body class for drag and rolling-resistance defaults. */
  bodyClass: BodyClass;
  /** Empty mass, kg, under {@link emptyMassDefinition}. */
  emptyMassKg: number;
  /** Which definition the empty mass follows. */
  emptyMassDefinition: EmptyMassDefinition;
  /** Gross vehicle mass rating, kg. */
  gvmKg: number;
  /** Gross combination mass rating, kg. */
  gcmKg: number;
  /** Front axle rating, kg (optional). */
  frontAxleRatingKg?: number;
  /** Rear axle rating, kg (optional). */
  rearAxleRatingKg?: number;
  /** Rated (braked) towing capacity, kg. */
  towingCapacityKg: number;
  /** Tow-ball (hitch) load limit, kg. */
  towBallLimitKg: number;
  /** Brakes at each front wheel. */
  frontBrakes: WheelBrake;
  /** Brakes at each rear wheel. */
  rearBrakes: WheelBrake;
  /** Pad family of the disc brakes. */
  padFamily: PadFamily;
  /** Brake fluid. */
  brakeFluid: BrakeFluid;
  /** Tyre outer diameter, m. */
  tyreDiameterM: number;
  /** Engine. */
  engine: Engine;
  /** Transmission: explicit ratios, or a generic preset. */
  transmission: Transmission | TransmissionPresetRef;
  /** Drag area Cd·A of the vehicle alone, m²; default by body class. */
  cdaM2?: number;
  /** Rolling-resistance coefficient (dimensionless); default by body class. */
  rollingResistance?: number;
  /** Front share of the service-brake force (dimensionless, 0–1); default 0.65. */
  frontBrakeShare?: number;
}

/** A trailer or caravan. */
export interface Trailer {
  /** Display name (the user's own words). */
  name: string;
  /** Camper or caravan ("trailer coach / camp trailer" in some rules), or another trailer. */
  kind: "caravan" | "camper" | "other";
  /** Tare mass, kg. */
  tareKg: number;
  /** Aggregate trailer mass rating (ATM), kg. */
  atmKg: number;
  /** Gross trailer mass rating (GTM), kg (optional). */
  gtmKg?: number;
  /** Number of axles. */
  axles: number;
  /** Service-brake type. */
  brakeType: TrailerBrakeType;
  /** Number of axles whose wheels are braked (0 when unbraked). */
  brakedAxles: number;
  /** Brakes at each braked wheel (required unless the brake type is "none"). */
  brakes?: WheelBrake;
  /** Brake-controller gain relative to ideal (dimensionless, 0–2; 1 = each unit brakes its own mass). */
  controllerGain?: number;
  /** Breakaway system. */
  breakaway: BreakawayKind;
  /** Drag area the trailer adds to the combination, m². */
  addedCdaM2: number;
  /** Hydraulic fluid of an electric-over-hydraulic system; default DOT 3, 2 years (conservative estimate). */
  brakeFluid?: BrakeFluid;
}

/** A tow-ball (hitch) mass: weighed, or estimated (and labelled so). */
export interface TowBallMass {
  /** Mass on the tow ball, kg. */
  massKg: number;
  /** Weighed, or an estimate. */
  source: "measured" | "estimate";
}

/** What the rig carries. */
export interface RigLoad {
  /** Everyone aboard including the driver, kg. */
  occupantsKg: number;
  /** Everything in or on the vehicle beyond its empty mass (accessories, cargo, fuel the empty mass omits), kg. */
  vehiclePayloadKg: number;
  /** Everything in the trailer beyond its tare (water, gas, gear), kg. */
  trailerLoadKg: number;
  /** Tow-ball mass; when absent the model estimates 10 % of the trailer's mass (common practice, labelled). */
  towBall?: TowBallMass;
  /** Weighbridge axle masses of the tow vehicle when coupled, kg (optional; enables the axle checks). */
  measuredAxleKg?: { front: number; rear: number };
}

/** A rig: tow vehicle, optional trailer, load. */
export interface Rig {
  /** The tow vehicle. */
  vehicle: TowVehicle;
  /** The trailer or caravan, if towing. */
  trailer?: Trailer;
  /** The load. */
  load: RigLoad;
}
