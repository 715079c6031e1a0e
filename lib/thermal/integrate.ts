/**
 * The heat-run hot loop: per step, the energy balance of docs/model.md §3, the split of §5, and the
 * exact temperature step of §7 at every brake position. Tight loop over typed arrays, no allocation per step.
 */

import { CELSIUS_TO_KELVIN, CONVECTION_SPEED_EXPONENT, STANDARD_GRAVITY, STEFAN_BOLTZMANN } from "./constants";
import { specificHeat } from "./cooling";
import { engineBrakingWheelPowerW, engineRpm } from "./engine";
import { exactStepC } from "./exact-step";
import { fadeCurveFor, frictionRatio, type FadeCurve } from "./fade";
import { splitRetardingWork } from "./partition";
import type { PreparedRoute } from "./prepare-route";
import type { ControlColumns } from "./range-controls";
import type { BrakePositionSpec, ResolvedModel } from "./resolve";
import { GRADE_SLACK, heldSpeeds } from "./speed-profile";
import { standstillSubsteps, type ThermalState } from "./standstill";
import { classifyBrake } from "./thresholds";
import { allocateTrace, type HeatTrace } from "./trace";

// Imported bindings copied to module constants once: bundlers and test transforms may turn every use of an
// import into a property read, which costs more than the arithmetic in this loop.
const stepC = exactStepC;
const classify = classifyBrake;
const cOf = specificHeat;
const wheelPower = engineBrakingWheelPowerW;
const rpmOf = engineRpm;
const splitWork = splitRetardingWork;
const ratioOf = frictionRatio;
const KELVIN = CELSIUS_TO_KELVIN;
const SPEED_EXPONENT = CONVECTION_SPEED_EXPONENT;

/** Mean step speed below which time is computed at this floor, m/s (two adjacent stops). */
const MIN_MEAN_SPEED_MS = 0.1;

/**
 * Integrate a heat run over a prepared route. One long function on purpose: it is the hot path (30,000 steps
 * per rig, a dozen rigs per request), kept free of calls that allocate.
 * @param route prepared route
 * @param model resolved model
 * @param stopS stop duration at each sample, s
 * @param start starting state (aligned with model.positions)
 * @param controls columns of the stretch controls (held speed caps, held gears), or null (default)
 * @returns the trace and the state at the end
 * @example integrateHeatRun(route, model, new Float64Array(route.n), start)
 */
export function integrateHeatRun(
  route: PreparedRoute,
  model: ResolvedModel,
  stopS: Float64Array,
  start: ThermalState,
  controls: ControlColumns | null = null,
): { trace: HeatTrace; finalState: ThermalState } {
  const { params, positions } = model;
  const P = positions.length;
  const n = route.n;
  const trace = allocateTrace(route.profile, P);
  const speed = heldSpeeds(route, model, stopS, controls);
  const heldGear = controls === null ? null : controls.gear;
  const engineFactor = model.engineFactor;
  const lockedFactor = model.lockedEngineFactor;
  trace.speedMs.set(speed);
  trace.stopS.set(stopS);
  const ta = params.ambientC;
  const taK = ta + CELSIUS_TO_KELVIN;
  const taK2 = taK * taK;
  const mg = model.massKg * STANDARD_GRAVITY;
  const halfMeff = 0.5 * model.effectiveMassKg;
  const halfCda = 0.5 * (params.cdaM2 ?? 0);
  const crrMg = (params.rollingResistance ?? 0) * mg;
  const frontShare = params.frontShare ?? 0;
  const gain = params.trailerGain ?? 0;
  const fixedW = params.engineBrakingPowerW;
  const maxRpm = params.maxRpm ?? 0;
  const fixedGear = params.gearPolicy.kind === "fixed" ? params.gearPolicy.gear - 1 : -1;
  const ratios = model.overallRatios;
  const G = model.highRangeGears;
  const gentlest = params.descentSpeeds.reduce((m, t) => (t.minDescentGrade < m ? t.minDescentGrade : m), Infinity);
  // Highest speed in each gear at the descent rpm limit (the rpm-band policy picks the first gear that fits).
  const vAtMax = Float64Array.from(ratios, (r) => maxRpm / engineRpm(1, r, model.tyreDiameterM));
  const temp = Float64Array.from(start.rotorC);
  const fluid = Float64Array.from(start.fluidC);
  const { wheels, gamma, ha0, haSlope, radK, mass, c20, cSlope, splitIndex, th } = positionColumns(positions);
  const split = new Float64Array(5);
  const fade = params.fadeFeedback;
  const curves: FadeCurve[] = positions.map((p) => fadeCurveFor(p.padFamily, p.thresholds));
  // Index of each split slot's position (front 1, rear 2, trailer 3), or −1 where the rig has none.
  const slotPos = [-1, -1, -1, -1];
  for (let j = 0; j < P; j++) slotPos[splitIndex[j] as number] = j;
  const towCapN = params.towBrakeCapacityMs2 * (model.massKg - model.trailerKg);
  const trailerCapN = params.trailerBrakeCapacityMs2 * model.trailerKg;
  const fluidGain = params.fluidGain;
  const fluidTau = params.fluidTimeConstantS;
  const E = trace.energy;
  const descentGrade = route.descentGrade;
  const gap = route.profile.gapAfter;

  recordSample(trace, 0, temp, fluid, th);
  applyStop(stopS[0] as number, positions, temp, fluid, ta, fluidGain, fluidTau);
  let time = 0;
  let lastVm = -1;
  let vPow = 0;
  let lastDt = -1;
  let fluidDecay = 0;
  for (let i = 0; i + 1 < n; i++) {
    const k = i + 1;
    const dl = route.pathM[i] as number;
    time += stopS[i] as number;
    if (gap[i] === 1 || dl === 0) {
      trace.timeS[k] = time;
      recordSample(trace, k, temp, fluid, th);
      applyStop(stopS[k] as number, positions, temp, fluid, ta, fluidGain, fluidTau);
      continue;
    }
    const v0 = speed[i] as number;
    const v1 = speed[k] as number;
    let vm = 0.5 * (v0 + v1);
    if (vm < MIN_MEAN_SPEED_MS) vm = MIN_MEAN_SPEED_MS;
    const dt = dl / vm;
    time += dt;
    const v2 = 0.5 * (v0 * v0 + v1 * v1);
    const ePot = mg * (route.dropM[i] as number);
    const eKin = halfMeff * (v0 * v0 - v1 * v1);
    const eAero = halfCda * (route.densityKgM3[i] as number) * v2 * dl;
    const eRoll = crrMg * (route.runM[i] as number);
    const surplus = ePot + eKin - eAero - eRoll;
    let g = G - 1;
    const held = heldGear === null ? 0 : (heldGear[i] as number);
    if (held > 0) g = held - 1;
    else if (fixedGear >= 0 && -(descentGrade[i] as number) >= gentlest - GRADE_SLACK) g = fixedGear;
    else for (let q = 0; q < G; q++) if (vm <= (vAtMax[q] as number)) { g = q; break; }
    if (surplus > 0) {
      trace.gear[k] = g + 1;
      const avail = fixedW !== null ? fixedW * dt
        : wheelPower(rpmOf(vm, ratios[g] ?? 1, model.tyreDiameterM), model.displacementM3,
          held > 0 ? lockedFactor : engineFactor, params.drivelineEfficiency, model.idleRpm) * dt;
      let rF = 1;
      let rR = 1;
      let rT = 1;
      if (fade) {
        const jf = slotPos[1] as number;
        const jr = slotPos[2] as number;
        const jt = slotPos[3] as number;
        if (jf >= 0) rF = ratioOf(temp[jf] as number, curves[jf] as FadeCurve);
        if (jr >= 0) rR = ratioOf(temp[jr] as number, curves[jr] as FadeCurve);
        if (jt >= 0) rT = ratioOf(temp[jt] as number, curves[jt] as FadeCurve);
      }
      splitWork(split, surplus, avail, model.trailerBrakeType, model.trailerMassShare, gain, frontShare,
        rF, rR, rT, towCapN * dl, trailerCapN * dl);
      trace.holdLost[k] = (split[4] as number) > 0 ? 1 : 0;
    } else {
      split.fill(0);
      E.driveJ[k] = -surplus;
    }
    E.potentialJ[k] = ePot;
    E.kineticJ[k] = eKin;
    E.aeroJ[k] = eAero;
    E.rollingJ[k] = eRoll;
    E.engineJ[k] = split[0] as number;
    trace.enginePowerW[k] = (split[0] as number) / dt;
    trace.timeS[k] = time;
    if (vm !== lastVm) {
      lastVm = vm;
      vPow = Math.pow(vm, SPEED_EXPONENT);
    }
    if (dt !== lastDt) {
      lastDt = dt;
      fluidDecay = -Math.expm1(-dt / fluidTau);
    }
    for (let j = 0; j < P; j++) {
      const work = split[splitIndex[j] as number] as number;
      (E.brakeJ[j] as Float64Array)[k] = work;
      const wheelW = work / (wheels[j] as number) / dt;
      (trace.brakePowerW[j] as Float64Array)[k] = wheelW;
      const t = temp[j] as number;
      const tk = t + KELVIN;
      const h = (ha0[j] as number) + (haSlope[j] as number) * vPow + (radK[j] as number) * (tk * tk + taK2) * (tk + taK);
      const c = cOf(t, c20[j] as number, cSlope[j] as number);
      const next = stepC(t, ta, (gamma[j] as number) * wheelW, h, (mass[j] as number) * c, dt);
      const f = fluid[j] as number;
      // fluidProxyStepC inlined with its decay factor cached per step length (same formula).
      if (f === f) fluid[j] = f + (ta + fluidGain * (0.5 * (t + next) - ta) - f) * fluidDecay;
      temp[j] = next;
    }
    recordSample(trace, k, temp, fluid, th);
    if (trace.holdLost[k] === 1) markRunaway(trace, k);
    applyStop(stopS[k] as number, positions, temp, fluid, ta, fluidGain, fluidTau);
  }
  return { trace, finalState: { rotorC: Array.from(temp), fluidC: Array.from(fluid) } };
}

/** @private Per-position thresholds for classification, °C. */
interface Thresholds {
  warm: Float64Array;
  hot: Float64Array;
  boil: Float64Array;
  ceiling: Float64Array;
}

/** @private Per-position constants as typed columns (aligned with the positions). */
function positionColumns(positions: readonly BrakePositionSpec[]) {
  const col = (f: (p: BrakePositionSpec) => number): Float64Array => Float64Array.from(positions, f);
  return {
    wheels: col((p) => p.wheels),
    gamma: col((p) => p.rotorPartition),
    ha0: col((p) => p.standstillConductanceWK),
    haSlope: col((p) => p.conductanceSlopeWK),
    radK: col((p) => p.emissivity * STEFAN_BOLTZMANN * p.radiatingAreaM2),
    mass: col((p) => p.massKg),
    c20: col((p) => p.specificHeat),
    cSlope: col((p) => p.specificHeatSlope),
    splitIndex: Int32Array.from(positions, (p) => (p.position === "front" ? 1 : p.position === "rear" ? 2 : 3)),
    th: {
      warm: col((p) => p.thresholds.warmC),
      hot: col((p) => p.thresholds.hotC),
      boil: col((p) => (p.fluid ? p.fluid.boilC : Infinity)),
      ceiling: col((p) => p.validityCeilingC),
    } satisfies Thresholds,
  };
}

/** @private Write the state and classes at sample k into the trace. */
function recordSample(trace: HeatTrace, k: number, temp: Float64Array, fluid: Float64Array, th: Thresholds): void {
  let worst = 0;
  for (let j = 0; j < temp.length; j++) {
    const t = temp[j] as number;
    const f = fluid[j] as number;
    (trace.rotorC[j] as Float64Array)[k] = t;
    (trace.fluidC[j] as Float64Array)[k] = f;
    const cls = classify(t, f, th.warm[j] as number, th.hot[j] as number, th.boil[j] as number, th.ceiling[j] as number);
    (trace.stepClass[j] as Uint8Array)[k] = cls;
    if (cls > worst) worst = cls;
  }
  trace.worstClass[k] = worst;
}

/** @private Class every position runaway at sample k (the brakes could not hold the speed there). */
function markRunaway(trace: HeatTrace, k: number): void {
  for (let j = 0; j < trace.stepClass.length; j++) (trace.stepClass[j] as Uint8Array)[k] = RUNAWAY;
  trace.worstClass[k] = RUNAWAY;
}

/** Index of the runaway class in STEP_CLASSES. */
const RUNAWAY = 4;

/** @private Cool the state in place through a stop of `durationS` (no-op for 0). */
function applyStop(
  durationS: number,
  positions: readonly BrakePositionSpec[],
  temp: Float64Array,
  fluid: Float64Array,
  ambientC: number,
  fluidGain: number,
  fluidTau: number,
): void {
  if (!(durationS > 0)) return;
  const pair = [0, 0];
  for (let j = 0; j < positions.length; j++) {
    pair[0] = temp[j] as number;
    pair[1] = fluid[j] as number;
    standstillSubsteps(pair, positions[j] as BrakePositionSpec, ambientC, durationS, fluidGain, fluidTau);
    temp[j] = pair[0] as number;
    fluid[j] = pair[1] as number;
  }
}
