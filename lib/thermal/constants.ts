/**
 * Physical constants and model-wide fixed values of the brake-heat model. Every value states its unit and its
 * source. Tags follow the provenance tags of docs/model.md: [S] seen in a named public source, [M] from memory (a handbook or
 * standard, not re-checked), [D] derived from plain physics, [E] an engineering estimate (a default, not a fact).
 */

/**
 * Version of the brake-heat model. Bump it whenever an equation or a default changes.
 *
 * Changelog (docs/model.md, "Changelog"):
 * - 2.0.0: fade feedback (a fading brake hands work to the others; electric trailer brakes through the
 *   controller, override brakes through the coupling push), hold capacity and the runaway class past a validity
 *   ceiling per disc and drum, one held speed per descent (a dip that is not a descent keeps the cruise speed),
 *   coasting instead of braking where a climb slows the rig, a transfer case's low range, every brake mass
 *   scalable.
 * - 1.1.0: stretch controls (HeatRunOptions.controls, range-controls.ts): a held-speed cap and a held gear
 *   (converter locked) on one stretch of the route, so advice is re-run on one descent only. Runs without
 *   controls give the same numbers as 1.0.0.
 * - 1.0.0: first model.
 */
export const MODEL_VERSION = "fadeline-thermal 2.0.0";

/** Standard gravity, m/s². Exact by definition (CGPM 1901; ISO 80000-3). */
export const STANDARD_GRAVITY = 9.80665;

/** Stefan–Boltzmann constant, W/(m²·K⁴). CODATA 2018 (exact since the 2019 SI redefinition). */
export const STEFAN_BOLTZMANN = 5.670374419e-8;

/** Offset from degrees Celsius to kelvin, K. Exact by definition of the Celsius scale. */
export const CELSIUS_TO_KELVIN = 273.15;

/** ISA sea-level air density, kg/m³. [M] International Standard Atmosphere (ISO 2533). */
export const ISA_SEA_LEVEL_DENSITY = 1.225;

/** ISA troposphere lapse coefficient L/T0 = 0.0065 / 288.15, 1/m. [M] ISO 2533; docs/model.md §3. */
export const ISA_LAPSE_PER_M = 2.25577e-5;

/** ISA density exponent g/(L·R) − 1 (dimensionless). [M] ISO 2533; docs/model.md §3. */
export const ISA_DENSITY_EXPONENT = 4.2559;

/** Upper limit of the ISA troposphere formula, m. [M] ISO 2533 (tropopause at 11 km). */
export const ISA_TROPOPAUSE_M = 11_000;

/**
 * Grey cast iron specific heat at 20 °C, J/(kg·K). [M] ASM handbook / *Brake Design and Safety* Table 3-1; docs/model.md §13.2 (range 440–500).
 */
export const CAST_IRON_SPECIFIC_HEAT = 460;

/**
 * Slope of the cast-iron specific heat with temperature, J/(kg·K²): c ≈ 460 + 0.4·(T − 20) up to ≈ 600 °C.
 * [M] fit to handbook data, docs/model.md §6.4; verify.
 */
export const CAST_IRON_SPECIFIC_HEAT_SLOPE = 0.4;

/** Temperature above which the c(T) fit is held constant, °C. [M] docs/model.md §6.4 (held constant above 600 °C). */
export const SPECIFIC_HEAT_FIT_MAX_C = 600;

/** Cast-iron thermal properties (ρ kg/m³, c J/(kg·K), k W/(m·K)). [M] docs/model.md §13.2 (G3000). */
export const CAST_IRON_PROPERTIES = { densityKgM3: 7200, specificHeat: 460, conductivity: 50 } as const;

/** Organic/NAO pad thermal properties (ρ, c, k). [M] docs/model.md §13.2. */
export const ORGANIC_PAD_PROPERTIES = { densityKgM3: 2000, specificHeat: 1000, conductivity: 1 } as const;

/** Semi-metallic pad thermal properties (ρ, c, k). [M] docs/model.md §13.2. */
export const SEMI_METALLIC_PAD_PROPERTIES = { densityKgM3: 2500, specificHeat: 900, conductivity: 5 } as const;

/**
 * Reference rotor diameter for the lumped convection law, m. The default hA(v) coefficients are for a vented
 * ute front rotor of about this size and scale with (D / D_ref)². [E] docs/model.md §13.2 (320–345 mm).
 */
export const REFERENCE_ROTOR_DIAMETER_M = 0.33;

/** Standstill conductance of the reference vented rotor, W/K. [E] docs/model.md §6.1 (hA_0 1.0–1.5, default 1.25). */
export const REFERENCE_HA0_W_PER_K = 1.25;

/**
 * Speed coefficient a of the reference vented rotor in hA = hA_0 + a·v^0.8, W/K per (m/s)^0.8.
 * [E] docs/model.md §6.1 (a ≈ 0.9; ≈ 10 W/K at 60 km/h).
 */
export const REFERENCE_HA_SLOPE = 0.9;

/** Speed exponent of the lumped convection law (dimensionless). [M] turbulent Re^0.8 scaling, docs/model.md §6.1. */
export const CONVECTION_SPEED_EXPONENT = 0.8;

/**
 * Radiating area per diameter squared, m²/m²: both friction faces of a disc of outer diameter D are ≈ 1.07·D²
 * (0.11 m² at 320 mm). [E] docs/model.md §6.2 (A_rad ≈ 0.10–0.12 m² for a 320 mm rotor).
 */
export const DISC_RADIATING_AREA_PER_D2 = 1.07;

/** Radiating area per diameter squared for a drum (outer shell and back face), m²/m². [E] */
export const DRUM_RADIATING_AREA_PER_D2 = 0.8;

/** Default emissivity of cast-iron friction faces (dimensionless). [M] docs/model.md §6.2, §13.1 (0.4–0.85). */
export const DEFAULT_EMISSIVITY = 0.55;

/** Conductance multiplier of a solid disc relative to a vented one. [E] docs/model.md §6.1 (≈ 0.6×). */
export const SOLID_DISC_COOLING_FACTOR = 0.6;

/** Conductance multiplier of a drum relative to a vented disc. [E] docs/model.md §6.1 (≈ 0.5×). */
export const DRUM_COOLING_FACTOR = 0.5;

/** Driver mass included in the EU mass in running order, kg. [M] Reg (EU) 1230/2012 (75 kg driver). */
export const RUNNING_ORDER_DRIVER_KG = 75;
