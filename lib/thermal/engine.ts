/**
 * Engine braking from the motoring-friction model (docs/model.md §3): P_mot = FMEP·V_d·n/120 for a
 * four-stroke engine [M] *Internal Combustion Engine Fundamentals* (1988) ch. 13; rpm = v·i_gear·i_final·60/(2π·r_dyn).
 */

/** Dynamic rolling radius over the unloaded tyre radius (dimensionless). [M] vehicle-dynamics textbooks, typical 0.95–0.98. */
export const DYNAMIC_RADIUS_FACTOR = 0.97;

/**
 * Motoring friction mean effective pressure of a light turbodiesel, Pa: a quadratic through the [E] values
 * of docs/model.md §3 (1.5 bar at 2,000, 2.0 bar at 3,000, 2.6 bar at 4,000 rpm):
 * FMEP = 0.8 + 0.25·(n/1000) + 0.05·(n/1000)² bar.
 * @param rpm engine speed, rev/min
 * @returns FMEP, Pa
 * @example motoringFmepPa(3000) // 200000
 */
export function motoringFmepPa(rpm: number): number {
  const k = rpm / 1000;
  return (0.8 + 0.25 * k + 0.05 * k * k) * 1e5;
}

/**
 * Motoring (retarding) power of a four-stroke engine P = FMEP·V_d·n/120 (check case C14).
 * @param fmepPa friction mean effective pressure, Pa
 * @param displacementM3 swept volume, m³
 * @param rpm engine speed, rev/min
 * @returns motoring power at the crankshaft, W
 * @example motoringPowerW(2e5, 0.0028, 3000) // 14000
 */
export function motoringPowerW(fmepPa: number, displacementM3: number, rpm: number): number {
  return (fmepPa * displacementM3 * rpm) / 120;
}

/**
 * Engine speed for a road speed in a gear.
 * @param speedMs road speed, m/s
 * @param overallRatio gear ratio × final-drive ratio (dimensionless)
 * @param tyreDiameterM tyre outer diameter, m (the dynamic radius is 0.97 of half of it)
 * @returns engine speed, rev/min
 * @example engineRpm(16.67, 2.1 * 3.9, 0.78) // ≈ 3446
 */
export function engineRpm(speedMs: number, overallRatio: number, tyreDiameterM: number): number {
  const rDyn = 0.5 * tyreDiameterM * DYNAMIC_RADIUS_FACTOR;
  return (speedMs * overallRatio * 60) / (2 * Math.PI * rDyn);
}

/**
 * The descent gear of the "rpm band" policy: the lowest gear (largest overall ratio) whose engine speed at
 * `speedMs` stays at or below `maxRpm` ("pick the lowest gear that keeps rpm at or below the user limit",
 * docs/model.md, "Engine braking"). The ratios may hold a low range after the high range (ResolvedModel), so
 * the largest fitting ratio is searched, not the first. Falls back to the gear with the smallest ratio when
 * every gear over-revs.
 * @param speedMs road speed, m/s
 * @param overallRatios gear × final-drive ratio per gear (dimensionless)
 * @param tyreDiameterM tyre outer diameter, m
 * @param maxRpm highest accepted engine speed, rev/min
 * @returns gear index, 0-based (0 = first gear)
 * @example chooseDescentGear(16.67, [13.65, 8.19, 5.66, 3.9], 0.78, 3800) // 1
 */
export function chooseDescentGear(
  speedMs: number,
  overallRatios: ArrayLike<number>,
  tyreDiameterM: number,
  maxRpm: number,
): number {
  const n = overallRatios.length;
  let best = -1;
  let smallest = 0;
  for (let g = 0; g < n; g++) {
    const r = overallRatios[g] ?? 0;
    if (r < (overallRatios[smallest] ?? 0)) smallest = g;
    if (engineRpm(speedMs, r, tyreDiameterM) <= maxRpm && (best < 0 || r > (overallRatios[best] ?? 0))) best = g;
  }
  return best >= 0 ? best : smallest;
}

/**
 * Retarding power of the engine at the wheels on overrun: motoring power × exhaust-brake factor × converter
 * factor × user scale, divided by the driveline efficiency (driveline friction adds to the retardation).
 * Zero below idle speed, where the clutch or converter decouples.
 * @param rpm engine speed, rev/min
 * @param displacementM3 swept volume, m³
 * @param factor exhaust-brake factor × converter factor × user scale (dimensionless)
 * @param drivelineEfficiency driveline efficiency (dimensionless, 0–1]
 * @param idleRpm idle speed, rev/min
 * @returns retarding power at the wheels, W
 * @example engineBrakingWheelPowerW(3000, 0.0028, 1, 1, 800) // 14000
 */
export function engineBrakingWheelPowerW(
  rpm: number,
  displacementM3: number,
  factor: number,
  drivelineEfficiency: number,
  idleRpm: number,
): number {
  if (rpm < idleRpm) return 0;
  return (motoringPowerW(motoringFmepPa(rpm), displacementM3, rpm) * factor) / drivelineEfficiency;
}
