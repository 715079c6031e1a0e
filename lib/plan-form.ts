import { formatSpeed, formatTemperature, M_PER_MI, type UnitSystem } from "@/lib/units";
import type { PlanInput } from "@/lib/validation/plan";

/** The plan form in the user's units (°C/°F, km/h or mph), as typed. */
export interface PlanFormValues {
  name: string;
  routeId: string;
  tripDate: string;
  ambient: string;
  startTemp: string;
  speedPolicy: "standard" | "cautious" | "cap";
  speedCap: string;
  drivingStyle: "steady" | "snub";
  notes: string;
  rigs: { rigId: string; label: string }[];
}

const toC = (value: string, units: UnitSystem) => (units === "metric" ? Number(value) : ((Number(value) - 32) * 5) / 9);
const fromC = (c: number, units: UnitSystem) => String(Math.round(units === "metric" ? c : (c * 9) / 5 + 32));
const toMs = (value: string, units: UnitSystem) => (units === "metric" ? Number(value) / 3.6 : (Number(value) * M_PER_MI) / 3600);
const fromMs = (ms: number, units: UnitSystem) => String(Math.round(units === "metric" ? ms * 3.6 : (ms * 3600) / M_PER_MI));

/** Form values (the user's units, as typed) from a stored plan (SI). */
export function planToForm(p: Partial<PlanInput>, units: UnitSystem): PlanFormValues {
  return {
    name: p.name ?? "",
    routeId: p.routeId ?? "",
    tripDate: p.tripDate ?? "",
    ambient: fromC(p.ambientC ?? 25, units),
    startTemp: p.startTempC === null || p.startTempC === undefined ? "" : fromC(p.startTempC, units),
    speedPolicy: p.speedPolicy ?? "standard",
    speedCap: p.speedCapMs ? fromMs(p.speedCapMs, units) : "",
    drivingStyle: p.drivingStyle ?? "steady",
    notes: p.notes ?? "",
    rigs: p.rigs ?? [{ rigId: "", label: "" }],
  };
}

export function formToInput(v: PlanFormValues, units: UnitSystem): unknown {
  const number = (s: string) => (s.trim() === "" ? Number.NaN : Number(s));
  return {
    name: v.name,
    routeId: v.routeId,
    tripDate: v.tripDate || null,
    ambientC: Number.isFinite(number(v.ambient)) ? toC(v.ambient, units) : undefined,
    startTempC: v.startTemp.trim() === "" ? null : toC(v.startTemp, units),
    speedPolicy: v.speedPolicy,
    speedCapMs: v.speedPolicy === "cap" && v.speedCap.trim() !== "" ? toMs(v.speedCap, units) : null,
    drivingStyle: v.drivingStyle,
    notes: v.notes,
    rigs: v.rigs,
  };
}


/** A plan's conditions in one plain sentence, in the user's units. */
export function planConditionsText(
  p: { tripDate: string | null; ambientC: number; startTempC: number | null; speedPolicy: "standard" | "cautious" | "cap"; speedCapMs: number | null; drivingStyle: "steady" | "snub" },
  units: UnitSystem,
): string {
  const date = p.tripDate ? `Trip on ${new Date(`${p.tripDate}T12:00:00Z`).toLocaleDateString("en-AU", { day: "numeric", month: "long", year: "numeric", timeZone: "UTC" })}. ` : "";
  const start = p.startTempC === null ? "brakes start at air temperature" : `brakes start at ${formatTemperature(p.startTempC, units)}`;
  const policy =
    p.speedPolicy === "cap" && p.speedCapMs !== null
      ? `descents held at ${formatSpeed(p.speedCapMs, units)} at most`
      : p.speedPolicy === "cautious"
        ? "cautious descent speeds (10 km/h under the standard ones)"
        : "standard descent speeds";
  const style = p.drivingStyle === "snub" ? "snub braking" : "steady light braking";
  return `${date}Air ${formatTemperature(p.ambientC, units)}; ${start}; ${policy}; ${style}.`;
}
