/**
 * The demo plans as a convoy leader reads them: per plan, each rig's verdict, its descents' peaks as planned
 * and with the advice, and the advice in words. Runs in process on the demo GPX files and rigs (no database).
 * Read it after every change to the model or the advice. Run: `npm run demo-report [-- --imperial]`.
 */
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { adviseWithBands, renderRigAdvice } from "../lib/advice";
import { conditionsToOptions, type PlanConditions } from "../lib/analysis/conditions";
import { placeWaypoints, processGpx } from "../lib/route";
import { prepareRoute } from "../lib/thermal";
import { formatTemperatureBand } from "../lib/units";
import { DEMO_OWNER_RIGS, DEMO_TEAM_RIGS, type DemoRig } from "../db/demo/rigs";

const DIR = join(__dirname, "../tests/fixtures/gpx/demo");
const steady = { startTempC: null, speedCapMs: null, drivingStyle: "steady" } as const;
/** The demo plans of db/seed.ts: route file, conditions, convoy. */
const PLANS: { name: string; file: string; conditions: PlanConditions; rigs: DemoRig[] }[] = [
  { name: "Marrow Creek shakedown", file: "marrow-creek-track.gpx", conditions: { ...steady, ambientC: 28, speedPolicy: "standard" }, rigs: DEMO_TEAM_RIGS },
  { name: "Kestrel Gap crossing", file: "tallowmere-to-kestrel-gap.gpx", conditions: { ...steady, ambientC: 31, speedPolicy: "standard" }, rigs: DEMO_TEAM_RIGS },
  { name: "Over Kestrel Gap with the van", file: "tallowmere-to-kestrel-gap.gpx", conditions: { ...steady, ambientC: 33, speedPolicy: "cautious" }, rigs: DEMO_OWNER_RIGS },
];

const system = process.argv.includes("--imperial") ? "imperial" : "metric";
for (const plan of PLANS) {
  const processed = processGpx(readFileSync(join(DIR, plan.file), "utf8"));
  if (!processed.ok) throw new Error(`${plan.file}: ${processed.problems.map((p) => p.message).join("; ")}`);
  const { profile, descents } = processed;
  const route = prepareRoute(profile, descents);
  const waypoints = placeWaypoints(profile, processed.gpx.waypoints).filter((w) => w.distanceM !== null);
  const options = conditionsToOptions(plan.conditions);
  console.log(`\n=== ${plan.name} (${plan.file}, ${descents.length} descents, ${plan.conditions.ambientC} °C)`);
  for (const member of plan.rigs) {
    const started = performance.now();
    const { advice } = adviseWithBands({ route, descents, rig: member.rig, options, waypoints, region: "AU" });
    console.log(`\n--- ${member.name} (${(performance.now() - started).toFixed(0)} ms)`);
    for (const p of advice.proof) {
      const d = descents[p.descentIndex]!;
      const peaks = (o: typeof p.asPlanned, band: { lowC: number; highC: number }[] | undefined) =>
        o.positions.map((q, j) => `${q.position} ${formatTemperatureBand(q.peakC, band?.[j] ?? null, q.ceilingC, system)}`).join(", ");
      const where = `${(d.startDistanceM / 1000).toFixed(1)}–${(d.endDistanceM / 1000).toFixed(1)} km, ${d.dropM.toFixed(0)} m, ${(d.meanGrade * 100).toFixed(1)} %`;
      console.log(`  descent ${p.descentIndex + 1} ${where}: as planned ${p.asPlanned.worstClass} (${peaks(p.asPlanned, p.band?.asPlanned)}); with advice ${p.withAdvice.worstClass} (${peaks(p.withAdvice, p.band?.withAdvice)})`);
    }
    if (advice.legalReasons.length > 0) console.log(`  law: ${advice.legalReasons.join(" | ")}`);
    for (const line of renderRigAdvice(advice, system)) console.log(`  ${line}`);
  }
}
