import { KG_PER_LB, type UnitSystem } from "@/lib/units";

/**
 * What each number on the rig form measures, and how it is shown. Exact factors: 1 lb = 0.45359237 kg,
 * 1 in = 25.4 mm (International Yard and Pound Agreement 1959; NIST SP 811 App. B), so 1 cu in = 16.387064 cm³.
 */
export type Quantity = "mass" | "diameter" | "displacement" | "area" | "plain" | "years" | "rpm" | "count";

export const M_PER_IN = 0.0254;
export const M3_PER_CU_IN = 0.0254 ** 3;

interface Display {
  unit: string;
  /** SI value → shown value. */
  show: (si: number) => number;
  /** Shown value → SI value. */
  read: (shown: number) => number;
  /** Decimals shown. */
  digits: number;
}

const same = (unit: string, digits: number): Display => ({ unit, show: (x) => x, read: (x) => x, digits });

/** The unit and conversions of a quantity in a unit system. */
export function displayOf(quantity: Quantity, units: UnitSystem): Display {
  const metric = units === "metric";
  switch (quantity) {
    case "mass":
      return metric ? same("kg", 0) : { unit: "lb", show: (kg) => kg / KG_PER_LB, read: (lb) => lb * KG_PER_LB, digits: 0 };
    case "diameter":
      return metric ? { unit: "mm", show: (m) => m * 1000, read: (mm) => mm / 1000, digits: 0 } : { unit: "in", show: (m) => m / M_PER_IN, read: (inch) => inch * M_PER_IN, digits: 1 };
    case "displacement":
      return metric ? { unit: "L", show: (m3) => m3 * 1000, read: (l) => l / 1000, digits: 2 } : { unit: "cu in", show: (m3) => m3 / M3_PER_CU_IN, read: (ci) => ci * M3_PER_CU_IN, digits: 0 };
    case "area":
      return metric ? same("m²", 2) : { unit: "sq ft", show: (m2) => m2 / 0.3048 ** 2, read: (ft2) => ft2 * 0.3048 ** 2, digits: 1 };
    case "years":
      return same("years", 1);
    case "rpm":
      return same("rpm", 0);
    case "count":
      return same("", 0);
    case "plain":
      return same("", 3);
  }
}

/** A stored SI value as the text a form field shows ("" when absent). */
export function toField(si: number | undefined | null, quantity: Quantity, units: UnitSystem): string {
  if (si === undefined || si === null || !Number.isFinite(si)) return "";
  const d = displayOf(quantity, units);
  return String(Number(d.show(si).toFixed(d.digits)));
}

/** A typed field back to SI: undefined when empty, NaN when not a number (the schema then says so). */
export function fromField(text: string, quantity: Quantity, units: UnitSystem): number | undefined {
  const trimmed = text.trim().replace(",", ".");
  if (trimmed === "") return undefined;
  const value = Number(trimmed);
  return Number.isFinite(value) ? displayOf(quantity, units).read(value) : Number.NaN;
}
