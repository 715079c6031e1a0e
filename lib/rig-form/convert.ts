import type { Rig } from "@/lib/thermal";
import type { UnitSystem } from "@/lib/units";
import { ALL_CHOICES, ALL_NUMBERS } from "./fields";
import { fromField, toField } from "./quantities";

/** The rig form's values: every number as typed (the user's units), choices as their codes, and switches. */
export interface RigFormValues {
  name: string;
  region: string;
  vehicleName: string;
  trailerName: string;
  hasTrailer: boolean;
  towBallMeasured: boolean;
  transmission: "generic-6-speed-automatic" | "generic-6-speed-manual" | "custom";
  customKind: "manual" | "automatic";
  gearRatios: string;
  finalDrive: string;
  converterLocked: boolean;
  values: Record<string, string>;
}

/** A form field's key for a schema path ("vehicle.gvmKg" → "vehicle__gvmKg"): flat, so the form library keeps it flat. */
export const fieldKey = (path: string) => path.replaceAll(".", "__");

const get = (o: unknown, path: string): unknown => path.split(".").reduce<unknown>((x, k) => (x as Record<string, unknown> | undefined)?.[k], o);
function set(o: Record<string, unknown>, path: string, value: unknown) {
  const keys = path.split(".");
  let at = o;
  for (const k of keys.slice(0, -1)) at = (at[k] ??= {}) as Record<string, unknown>;
  at[keys.at(-1)!] = value;
}

/** Form values from a rig (SI) for the user's unit system. */
export function rigToForm(rig: Rig, name: string, region: string, units: UnitSystem): RigFormValues {
  const values: Record<string, string> = {};
  for (const f of ALL_NUMBERS) values[fieldKey(f.path)] = toField(get(rig, f.path) as number | undefined, f.quantity, units);
  for (const f of ALL_CHOICES) values[fieldKey(f.path)] = String(get(rig, f.path) ?? f.options[0]![0]);
  const t = rig.vehicle.transmission;
  return {
    name,
    region,
    vehicleName: rig.vehicle.name,
    trailerName: rig.trailer?.name ?? "Trailer",
    hasTrailer: rig.trailer !== undefined,
    towBallMeasured: rig.load.towBall?.source === "measured",
    transmission: "preset" in t ? t.preset : "custom",
    customKind: "preset" in t ? "automatic" : t.kind,
    gearRatios: "preset" in t ? "" : t.gearRatios.join(", "),
    finalDrive: "preset" in t ? "" : String(t.finalDrive),
    converterLocked: t.converterLocked ?? false,
    values,
  };
}

/**
 * The rig (SI) the form describes, ready for the rig schema to check. Empty optional fields are left out;
 * numbers that are not numbers become NaN so the schema names them.
 */
export function formToRig(v: RigFormValues, units: UnitSystem): { name: string; region: string; rig: unknown } {
  const rig: Record<string, unknown> = {};
  for (const f of ALL_NUMBERS) {
    if (!v.hasTrailer && f.path.startsWith("trailer.")) continue;
    const si = fromField(v.values[fieldKey(f.path)] ?? "", f.quantity, units);
    if (si !== undefined) set(rig, f.path, si);
    else if (!f.optional) set(rig, f.path, undefined);
  }
  for (const f of ALL_CHOICES) if (v.hasTrailer || !f.path.startsWith("trailer.")) set(rig, f.path, v.values[fieldKey(f.path)]);
  set(rig, "vehicle.name", v.vehicleName);
  const ratios = v.gearRatios.split(/[\s,;]+/).filter(Boolean).map(Number);
  set(
    rig,
    "vehicle.transmission",
    v.transmission === "custom"
      ? { kind: v.customKind, gearRatios: ratios, finalDrive: Number(v.finalDrive), ...(v.customKind === "automatic" ? { converterLocked: v.converterLocked } : {}) }
      : { preset: v.transmission, ...(v.transmission.endsWith("automatic") ? { converterLocked: v.converterLocked } : {}) },
  );
  const load = rig.load as Record<string, unknown>;
  if (load.towBall) (load.towBall as Record<string, unknown>).source = v.towBallMeasured ? "measured" : "estimate";
  if (v.hasTrailer) {
    const trailer = rig.trailer as Record<string, unknown>;
    trailer.name = v.trailerName;
    if (trailer.brakeType === "none") delete trailer.brakes;
  } else {
    delete rig.trailer;
  }
  return { name: v.name, region: v.region, rig: JSON.parse(JSON.stringify(rig, (_k, x) => (Number.isNaN(x) ? "not a number" : x))) };
}
