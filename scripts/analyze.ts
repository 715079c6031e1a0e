/**
 * Command-line heat run: `npm run analyze -- <route.gpx> --rig <rig.json | preset:NAME> [--json] [--full]`.
 * Reads the GPX with lib/route, checks the rig against the rig JSON schema (lib/validation/rig.ts, the same
 * one the API and the forms use), runs lib/thermal and prints a table per descent, or the whole analysis
 * result as JSON (--json; --full keeps every trace sample). Nothing is stored. Estimates only.
 */
import { readFileSync } from "node:fs";
import { parseArgs } from "node:util";
import { analyzeRoute, type AnalysisResult } from "../lib/analysis/analyze";
import { RIG_PRESETS } from "../lib/analysis/presets";
import { processGpx } from "../lib/route";
import { rigSchema } from "../lib/validation/rig";

function fail(message: string): never {
  process.stderr.write(`analyze: ${message}\n`);
  process.exit(1);
}

const { values, positionals } = parseArgs({
  allowPositionals: true,
  options: { rig: { type: "string" }, json: { type: "boolean", default: false }, full: { type: "boolean", default: false } },
});
const gpxPath = positionals[0];
if (!gpxPath || !values.rig) fail("usage: npm run analyze -- <route.gpx> --rig <rig.json | preset:ute-and-caravan | preset:wagon-and-camper> [--json] [--full]");

function loadRig(spec: string): unknown {
  if (spec.startsWith("preset:")) {
    const preset = RIG_PRESETS.rigs[spec.slice(7) as keyof typeof RIG_PRESETS.rigs];
    return preset ?? fail(`unknown preset ${spec}; choose ${Object.keys(RIG_PRESETS.rigs).map((k) => `preset:${k}`).join(", ")}`);
  }
  try {
    return JSON.parse(readFileSync(spec, "utf8"));
  } catch (error) {
    return fail(`cannot read ${spec}: ${(error as Error).message}`);
  }
}

const parsedRig = rigSchema.safeParse(loadRig(values.rig));
if (!parsedRig.success) fail(`the rig does not fit the rig schema:\n${parsedRig.error.issues.map((i) => `  ${i.path.join(".") || "(rig)"}: ${i.message}`).join("\n")}`);

let text: string;
try {
  text = readFileSync(gpxPath, "utf8");
} catch (error) {
  fail(`cannot read ${gpxPath}: ${(error as Error).message}`);
}
const route = processGpx(text);
if (!route.ok) fail(`the GPX cannot be used:\n${route.problems.map((p) => `  ${p.message}`).join("\n")}`);

const result = analyzeRoute(route.profile, route.descents, parsedRig.data, {}, values.full ? "full" : values.json ? "sampled" : "none");
if (values.json) {
  process.stdout.write(`${JSON.stringify(result, null, 2)}\n`);
} else {
  process.stdout.write(table(result));
}

function table(r: AnalysisResult): string {
  const km = (m: number) => (m / 1000).toFixed(1);
  const head = ["#", "from–to km", "drop m", "mean %", ...r.positions.map((p) => `${p.position} peak °C`), "worst class", "hot s"];
  const rows = r.descents.map((d, i) => [
    String(i + 1),
    `${km(d.startM)}–${km(d.endM)}`,
    d.dropM.toFixed(0),
    (d.descent.meanGrade * 100).toFixed(1),
    ...d.positions.map((p) => p.peakC.toFixed(0)),
    d.worstClass,
    Math.max(...d.positions.map((p) => p.timeHotOrAboveS)).toFixed(0),
  ]);
  const widths = head.map((h, c) => Math.max(h.length, ...rows.map((row) => row[c]!.length)));
  const line = (cells: string[]) => cells.map((cell, c) => cell.padStart(widths[c]!)).join("  ");
  const peaks = r.peaks.map((p) => `${p.position} ${p.peakC.toFixed(0)} °C at ${km(p.atM)} km`).join(", ");
  return [
    `Route ${km(r.route.lengthM)} km, ${r.route.descentCount} descents; model ${r.modelVersion}`,
    line(head),
    ...rows.map(line),
    `Peaks over the whole route: ${peaks}; worst class: ${r.worstClass}.`,
    "Estimates only: follow the vehicle maker's ratings, local road rules and a licensed mechanic.",
    "",
  ].join("\n");
}
