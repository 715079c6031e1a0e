/**
 * Command-line heat run:
 *   npm run analyze -- <route.gpx> --rig <rig.json | preset:NAME> [--json] [--full]
 *     [--set <param>=<value>]… [--advice] [--reading <position>@<km>=<°C>[+<min>]]…
 * Reads the GPX with lib/route, checks the rig against the rig JSON schema (lib/validation/rig.ts, the same
 * one the API and the forms use), runs lib/thermal with its band and prints a table per descent, or the whole
 * analysis result as JSON (--json; --full keeps every trace sample). --set overrides a model parameter by its
 * name in `model.params`; --reading calibrates the rig's cooling factor and engine braking to brake readings
 * (lib/thermal/calibrate.ts) and re-forecasts with them; --advice adds the rig's advice (lib/advice). Nothing
 * is stored. Estimates only.
 */
import { readFileSync } from "node:fs";
import { parseArgs } from "node:util";
import { adviseWithBands, renderRigAdvice } from "../lib/advice";
import { adviceReport, summarizeAnalysis, type AnalysisResult, type PeakReport } from "../lib/analysis/analyze";
import { RIG_PRESETS } from "../lib/analysis/presets";
import { placeWaypoints, processGpx } from "../lib/route";
import {
  calibrate,
  DEFAULT_PARAMS,
  prepareRoute,
  runBand,
  runPrepared,
  type BrakeReading,
  type CalibrationResult,
  type HeatRunOptions,
  type ModelParamsInput,
} from "../lib/thermal";
import { rigSchema } from "../lib/validation/rig";

function fail(message: string): never {
  process.stderr.write(`analyze: ${message}\n`);
  process.exit(1);
}

const USAGE =
  "usage: npm run analyze -- <route.gpx> --rig <rig.json | preset:ute-and-caravan | preset:wagon-and-camper> " +
  "[--json] [--full] [--set <param>=<value>]… [--advice] [--reading <front|rear|trailer>@<km>=<°C>[+<minutes>]]…";

let parsed: ReturnType<typeof parseCommandLine>;
function parseCommandLine() {
  return parseArgs({
    allowPositionals: true,
    options: {
      rig: { type: "string" },
      json: { type: "boolean", default: false },
      full: { type: "boolean", default: false },
      set: { type: "string", multiple: true, default: [] },
      reading: { type: "string", multiple: true, default: [] },
      advice: { type: "boolean", default: false },
    },
  });
}
try {
  parsed = parseCommandLine();
} catch (error) {
  fail(`${(error as Error).message}\n${USAGE}`);
}
const { values, positionals } = parsed;
const gpxPath = positionals[0];
if (!gpxPath || !values.rig) fail(USAGE);

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

/** `--set name=value`: a parameter of `model.params` and a number, true, false, null or a JSON value. */
function parseSettings(items: readonly string[]): ModelParamsInput {
  const names = Object.keys(DEFAULT_PARAMS);
  const out: Record<string, unknown> = {};
  for (const item of items) {
    const eq = item.indexOf("=");
    if (eq <= 0) fail(`--set ${item}: expected <param>=<value>, e.g. --set coolingFactor=0.8`);
    const name = item.slice(0, eq).trim();
    const text = item.slice(eq + 1).trim();
    if (!names.includes(name)) fail(`--set ${name}: unknown parameter; valid names are ${names.join(", ")}`);
    let value: unknown;
    try {
      value = JSON.parse(text);
    } catch {
      fail(`--set ${name}=${text}: the value must be a number, true, false, null or JSON`);
    }
    out[name] = value;
  }
  return out as ModelParamsInput;
}

/** `--reading front@12.5=240` or `front@12.5=240+10` (10 minutes after stopping). */
function parseReadings(items: readonly string[]): BrakeReading[] {
  const number = "([-+]?\\d+(?:\\.\\d+)?)";
  const pattern = new RegExp(`^(front|rear|trailer)@${number}=${number}(?:\\+(\\d+(?:\\.\\d+)?))?$`);
  return items.map((item) => {
    const m = pattern.exec(item.replace(/\s+|°C/g, ""));
    if (!m) fail(`--reading ${item}: expected <front|rear|trailer>@<km>=<°C>[+<minutes>], e.g. --reading front@12.5=240+5`);
    return {
      position: m[1] as BrakeReading["position"],
      atM: Number(m[2]) * 1000,
      tempC: Number(m[3]),
      ...(m[4] !== undefined ? { minutesAfterStop: Number(m[4]) } : {}),
    };
  });
}

const settings = parseSettings(values.set);
const readings = parseReadings(values.reading);
const parsedRig = rigSchema.safeParse(loadRig(values.rig));
if (!parsedRig.success) fail(`the rig does not fit the rig schema:\n${parsedRig.error.issues.map((i) => `  ${i.path.join(".") || "(rig)"}: ${i.message}`).join("\n")}`);
const rig = parsedRig.data;

let text: string;
try {
  text = readFileSync(gpxPath, "utf8");
} catch (error) {
  fail(`cannot read ${gpxPath}: ${(error as Error).message}`);
}
const route = processGpx(text);
if (!route.ok) fail(`the GPX cannot be used:\n${route.problems.map((p) => `  ${p.message}`).join("\n")}`);

/** The model's own range and type errors, said in terms of the command line. */
function modelError(error: unknown): never {
  if (!(error instanceof TypeError || error instanceof RangeError)) throw error;
  const message = error.message;
  if (message.includes("options.params.")) fail(`invalid --set value: ${message.replace(/options\.params\./g, "")}`);
  fail(`the model cannot run with these inputs: ${message}`);
}

const prepared = prepareRoute(route.profile, route.descents);
let options: HeatRunOptions = Object.keys(settings).length ? { params: settings } : {};
let calibration: CalibrationResult | null = null;
let output: AnalysisResult & { calibration?: CalibrationResult; advice?: ReturnType<typeof adviceReport> };
let adviceText: string[] = [];
try {
  if (readings.length > 0) {
    calibration = calibrate(prepared, rig, readings, options);
    options = { ...options, params: { ...settings, ...calibration.fitted } };
  }
  const nominal = runPrepared(prepared, rig, options);
  const band = runBand(prepared, rig, options, {}, nominal);
  const detail = values.full ? "full" : values.json ? "sampled" : "none";
  output = summarizeAnalysis(route.profile, route.descents, nominal, detail, band);
  if (calibration) output.calibration = calibration;
  if (values.advice) {
    const waypoints = placeWaypoints(route.profile, route.gpx.waypoints);
    const { advice } = adviseWithBands({ route: prepared, descents: route.descents, rig, options, waypoints, asPlanned: nominal, region: "AU" });
    output.advice = adviceReport(advice);
    adviceText = renderRigAdvice(advice, "metric");
  }
} catch (error) {
  modelError(error);
}

if (values.json) {
  process.stdout.write(`${JSON.stringify(output, null, 2)}\n`);
} else {
  process.stdout.write(table(output, calibration, adviceText));
}

/** A peak in words: "about 240 °C (210–290)", "beyond range" at or past the validity ceiling. */
function peakText(p: PeakReport, ceilingC: number): string {
  if (p.beyondValidity) return "beyond range";
  const edge = (x: number) => (x >= ceilingC ? "beyond range" : String(Math.round(x / 10) * 10));
  const band = p.band ? ` (${edge(p.band.lowC)}–${edge(p.band.highC)})` : "";
  return `about ${Math.round(p.peakC / 10) * 10} °C${band}`;
}

function table(r: AnalysisResult, cal: CalibrationResult | null, advice: string[]): string {
  const km = (m: number) => (m / 1000).toFixed(1);
  const ceilings = r.positions.map((p) => p.validityCeilingC);
  const head = ["#", "from–to km", "drop m", "mean %", ...r.positions.map((p) => `${p.position} peak °C`), "worst class", "hot s"];
  const rows = r.descents.map((d, i) => [
    String(i + 1),
    `${km(d.startM)}–${km(d.endM)}`,
    d.dropM.toFixed(0),
    (d.descent.meanGrade * 100).toFixed(1),
    ...d.positions.map((p, j) => peakText(p, ceilings[j]!)),
    d.worstClass,
    Math.max(...d.positions.map((p) => p.timeHotOrAboveS)).toFixed(0),
  ]);
  const widths = head.map((h, c) => Math.max(h.length, ...rows.map((row) => row[c]!.length)));
  const line = (cells: string[]) => cells.map((cell, c) => cell.padStart(widths[c]!)).join("  ");
  const peaks = r.peaks.map((p, j) => `${p.position} ${peakText(p, ceilings[j]!)} at ${km(p.atM)} km`).join(", ");
  const out = [`Route ${km(r.route.lengthM)} km, ${r.route.descentCount} descents; model ${r.modelVersion}`];
  if (cal) out.push(...calibrationLines(cal));
  out.push(
    line(head),
    ...rows.map(line),
    `Peaks over the whole route: ${peaks}; worst class: ${r.worstClass}.`,
    r.band ? `Bands: 10th–90th percentile of ${r.band.members} heat runs over the uncertain parameters (cooling, engine braking, heat split, trailer gain, brake mass).` : "",
  );
  if (advice.length) out.push("", ...advice);
  out.push("Estimates only: follow the vehicle maker's ratings, local road rules and a licensed mechanic.", "");
  return out.filter((l, i, all) => l !== "" || i === all.length - 1 || all[i - 1] !== "").join("\n");
}

function calibrationLines(cal: CalibrationResult): string[] {
  const f = cal.fitted;
  const rms = (x: number) => (Number.isFinite(x) ? `${x.toFixed(1)} K` : "n/a");
  const out = [
    `Calibration from ${cal.readings.length} reading${cal.readings.length === 1 ? "" : "s"}: cooling factor ${f.coolingFactor.toFixed(2)}, ` +
      `engine braking ${f.engineBrakingScale.toFixed(2)}${cal.fittedParameters.includes("engineBrakingScale") ? "" : " (kept)"}; ` +
      `RMS ${rms(cal.rmsBeforeK)} before, ${rms(cal.rmsAfterK)} after. The forecast below uses the fitted factors.`,
  ];
  for (const fl of cal.flagged) {
    const r = fl.reading;
    out.push(`  Left out: ${r.position} at ${(r.atM / 1000).toFixed(1)} km, ${r.tempC} °C: ${fl.reason}.`);
  }
  for (const note of cal.notes) out.push(`  ${note}`);
  return out;
}
