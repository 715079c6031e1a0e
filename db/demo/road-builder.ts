/**
 * Lays out invented roads on the demo island's terrain (./terrain.ts) as a dense centre line (a point every
 * {@link STEP_M} metres in the local frame of ./region.ts). Two ways to extend a road:
 *
 * - {@link RoadBuilder.curveTo}: a winding road through given points (uniform Catmull–Rom spline through
 *   jittered intermediate points; E. Catmull and R. Rom, "A class of local interpolating splines", in
 *   Computer Aided Geometric Design, Academic Press, 1974). The road takes whatever grade the terrain has.
 * - {@link RoadBuilder.traceGrade}: a road engineered to a constant grade, the way mountain roads are laid
 *   out: at every step it takes the heading θ whose directional derivative ∇h·(cos θ, sin θ) equals the
 *   grade, θ = φ ± arccos(g / |∇h|) with φ the uphill direction; where the ground is gentler it heads
 *   straight for its target. Inside a corridor it climbs in switchbacks, turning on hairpins of a given
 *   radius when it reaches the corridor's edge.
 */
import type { Rand } from "./prng";
import { terrainGradient } from "./terrain";

/** Spacing of the centre line, m. */
export const STEP_M = 2;

/** Options of {@link RoadBuilder.traceGrade}. Lengths in m, grades dimensionless (+ uphill). */
export interface TraceOptions {
  /** Grade to hold where the ground allows it (0.09 climbs at 9 %, −0.09 descends at 9 %). */
  grade: number;
  /** Where the road is going, m in the local frame. */
  target: readonly [number, number];
  /** Stop this close to the target. Default 20 m. */
  stopWithinM?: number;
  /** Stop as soon as this is true at the road's end. */
  stopWhen?: (eastM: number, northM: number) => boolean;
  /** Tightest bend outside hairpins, m. Default 70 m. */
  minRadiusM?: number;
  /**
   * Where the ground is gentler than the grade: head for the target (default) or go straight down the
   * fall line (a descent that should reach its grade as soon as the ground allows).
   */
  whenGentle?: "target" | "fall-line";
  /** Climb in switchbacks inside a corridor around the line from here to the target. */
  switchbacks?: { halfWidthM: number; hairpinRadiusM: () => number };
  /** Safety stop: longer traces throw. Default 40 km. */
  maxLengthM?: number;
}

/** Signed angle a − b wrapped into (−π, π]. */
function angleDiff(a: number, b: number): number {
  return Math.atan2(Math.sin(a - b), Math.cos(a - b));
}

/** Builds one road's centre line step by step. */
export class RoadBuilder {
  /** Centre line, m east and north in the local frame. */
  readonly east: number[] = [];
  readonly north: number[] = [];
  private heading: number;

  /**
   * @param start first point, m in the local frame
   * @param headingRad initial direction, radians counter-clockwise from east
   */
  constructor(start: readonly [number, number], headingRad: number) {
    this.east.push(start[0]);
    this.north.push(start[1]);
    this.heading = headingRad;
  }

  /** The road's current end, m. */
  end(): [number, number] {
    return [this.east[this.east.length - 1] as number, this.north[this.north.length - 1] as number];
  }

  private step(): void {
    const [x, y] = this.end();
    this.east.push(x + STEP_M * Math.cos(this.heading));
    this.north.push(y + STEP_M * Math.sin(this.heading));
  }

  /**
   * Extends the road through `via` with gentle bends: intermediate control points about every `spacingM`,
   * each moved sideways by up to `jitterM`, joined by a Catmull–Rom spline that leaves along the current
   * heading.
   * @param via points to pass, m; the last is where the road ends
   * @param rand seeded uniform source for the jitter
   */
  curveTo(via: readonly (readonly [number, number])[], rand: Rand, spacingM = 900, jitterM = 140): void {
    const controls: [number, number][] = [this.end()];
    for (const p of via) {
      const [ax, ay] = controls[controls.length - 1] as [number, number];
      const len = Math.hypot(p[0] - ax, p[1] - ay);
      const n = Math.max(1, Math.round(len / spacingM));
      for (let i = 1; i < n; i++) {
        const off = (2 * rand() - 1) * jitterM;
        const t = i / n;
        controls.push([ax + t * (p[0] - ax) - (off * (p[1] - ay)) / len, ay + t * (p[1] - ay) + (off * (p[0] - ax)) / len]);
      }
      controls.push([p[0], p[1]]);
    }
    // A phantom point that makes the spline leave along the current heading: the uniform Catmull–Rom
    // tangent at P0 is (P1 − P₋₁) / 2.
    const first = controls[0] as [number, number];
    const second = controls[1] as [number, number];
    const lead = Math.hypot(second[0] - first[0], second[1] - first[1]);
    const before: [number, number] = [second[0] - 2 * lead * Math.cos(this.heading), second[1] - 2 * lead * Math.sin(this.heading)];
    const last = controls[controls.length - 1] as [number, number];
    const prev = controls[controls.length - 2] as [number, number];
    const pts = [before, ...controls, [2 * last[0] - prev[0], 2 * last[1] - prev[1]] as [number, number]];
    // Dense spline samples, then re-spaced at STEP_M along their length.
    let carry = 0;
    let [px, py] = this.end();
    for (let i = 1; i + 2 < pts.length; i++) {
      const p0 = pts[i - 1] as [number, number];
      const p1 = pts[i] as [number, number];
      const p2 = pts[i + 1] as [number, number];
      const p3 = pts[i + 2] as [number, number];
      const samples = Math.max(8, Math.ceil(Math.hypot(p2[0] - p1[0], p2[1] - p1[1]) / 0.5));
      for (let k = 1; k <= samples; k++) {
        const t = k / samples;
        const cr = (a: number, b: number, c: number, d: number) =>
          0.5 * (2 * b + (-a + c) * t + (2 * a - 5 * b + 4 * c - d) * t * t + (-a + 3 * b - 3 * c + d) * t * t * t);
        const qx = cr(p0[0], p1[0], p2[0], p3[0]);
        const qy = cr(p0[1], p1[1], p2[1], p3[1]);
        const len = Math.hypot(qx - px, qy - py);
        // Place a centre-line point wherever the distance along the curve since the last one reaches STEP_M.
        let at = STEP_M - carry;
        for (; at <= len; at += STEP_M) {
          const [lx, ly] = this.end();
          const [nx, ny] = [px + (at / len) * (qx - px), py + (at / len) * (qy - py)];
          this.heading = Math.atan2(ny - ly, nx - lx);
          this.east.push(nx);
          this.north.push(ny);
        }
        carry = len - (at - STEP_M);
        [px, py] = [qx, qy];
      }
    }
  }

  /**
   * Extends the road at a constant grade towards a target (see the module comment).
   * @param options grade, target, stop rules and switchback corridor
   * @throws Error when the trace runs longer than `maxLengthM` (a generator bug)
   */
  traceGrade(options: TraceOptions): void {
    const { grade, target } = options;
    const stopWithin = options.stopWithinM ?? 20;
    const maxSteps = (options.maxLengthM ?? 40_000) / STEP_M;
    const turn = STEP_M / (options.minRadiusM ?? 70);
    const [sx, sy] = this.end();
    const axisLen = Math.hypot(target[0] - sx, target[1] - sy);
    const ax = (target[0] - sx) / axisLen;
    const ay = (target[1] - sy) / axisLen;
    let side = 0; // switchback side: +1 holds φ + β, −1 holds φ − β
    for (let n = 0; ; n++) {
      const [x, y] = this.end();
      if (n > maxSteps) throw new Error(`traceGrade: the road never reached its target (stuck near ${x.toFixed(0)}, ${y.toFixed(0)})`);
      if (Math.hypot(target[0] - x, target[1] - y) < stopWithin || options.stopWhen?.(x, y)) return;
      const [gx, gy] = terrainGradient(x, y);
      const slope = Math.hypot(gx, gy);
      let desired = Math.atan2(target[1] - y, target[0] - x);
      if (options.whenGentle === "fall-line" && slope > 1e-3) desired = Math.atan2(Math.sign(grade) * gy, Math.sign(grade) * gx);
      if (slope > Math.abs(grade)) {
        const uphill = Math.atan2(gy, gx);
        const beta = Math.acos(Math.min(1, Math.max(-1, grade / slope)));
        if (side === 0) side = Math.abs(angleDiff(uphill + beta, this.heading)) <= Math.abs(angleDiff(uphill - beta, this.heading)) ? 1 : -1;
        desired = uphill + side * beta;
        const corridor = options.switchbacks;
        if (corridor) {
          const lateral = ax * (y - sy) - ay * (x - sx);
          const outward = lateral * (ax * Math.sin(this.heading) - ay * Math.cos(this.heading)) > 0;
          if (outward && Math.abs(lateral) > corridor.halfWidthM) {
            this.hairpin(side, grade, corridor.hairpinRadiusM());
            side = -side;
            continue;
          }
        } else if (Math.abs(angleDiff(uphill - side * beta, this.heading)) < Math.abs(angleDiff(desired, this.heading)) - 0.3) {
          side = -side; // the other solution is clearly closer to where the road is going
          desired = uphill + side * beta;
        }
      }
      const d = angleDiff(desired, this.heading);
      this.heading += Math.max(-turn, Math.min(turn, d));
      this.step();
    }
  }

  /** Turns through the fall line on a circle of `radiusM` until the road holds the grade on the other side. */
  private hairpin(side: number, grade: number, radiusM: number): void {
    const rate = STEP_M / radiusM;
    for (let n = 0; n < 10_000; n++) {
      const [x, y] = this.end();
      const [gx, gy] = terrainGradient(x, y);
      const beta = Math.acos(Math.min(1, Math.max(-1, grade / Math.hypot(gx, gy))));
      const other = Math.atan2(gy, gx) - side * beta;
      if (side * angleDiff(this.heading, other) <= 0) return;
      this.heading -= side * rate;
      this.step();
    }
    throw new Error("hairpin: the road never turned round");
  }
}
