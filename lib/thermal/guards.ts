/**
 * Guard clauses with exact messages (Turf style): TypeError for a wrong type, RangeError for an impossible
 * value. The app's zod layer sits in front; these protect the model when it is called directly.
 */

/**
 * Require a finite number.
 * @param value the value
 * @param name the field's path, e.g. "rig.vehicle.gvmKg"
 * @returns the value
 * @example requireFinite(1, "x") // 1
 */
export function requireFinite(value: unknown, name: string): number {
  if (typeof value !== "number") throw new TypeError(`${name} must be a number`);
  if (!Number.isFinite(value)) throw new RangeError(`${name} must be finite`);
  return value;
}

/**
 * Require a finite number > 0.
 * @param value the value
 * @param name the field's path
 * @returns the value
 * @example requirePositive(2, "x") // 2
 */
export function requirePositive(value: unknown, name: string): number {
  const v = requireFinite(value, name);
  if (v <= 0) throw new RangeError(`${name} must be greater than 0`);
  return v;
}

/**
 * Require a finite number ≥ 0.
 * @param value the value
 * @param name the field's path
 * @returns the value
 * @example requireNonNegative(0, "x") // 0
 */
export function requireNonNegative(value: unknown, name: string): number {
  const v = requireFinite(value, name);
  if (v < 0) throw new RangeError(`${name} must be 0 or more`);
  return v;
}

/**
 * Require a finite number in [min, max].
 * @param value the value
 * @param name the field's path
 * @param min lower bound (inclusive)
 * @param max upper bound (inclusive)
 * @returns the value
 * @example requireBetween(0.5, "x", 0, 1) // 0.5
 */
export function requireBetween(value: unknown, name: string, min: number, max: number): number {
  const v = requireFinite(value, name);
  if (v < min || v > max) throw new RangeError(`${name} must be between ${min} and ${max}`);
  return v;
}

/**
 * Require an integer in [min, max].
 * @param value the value
 * @param name the field's path
 * @param min lower bound (inclusive)
 * @param max upper bound (inclusive)
 * @returns the value
 * @example requireInteger(2, "x", 1, 4) // 2
 */
export function requireInteger(value: unknown, name: string, min: number, max: number): number {
  const v = requireFinite(value, name);
  if (!Number.isInteger(v) || v < min || v > max) {
    throw new RangeError(`${name} must be a whole number from ${min} to ${max}`);
  }
  return v;
}

/**
 * Require one of a fixed set of strings.
 * @param value the value
 * @param name the field's path
 * @param options the allowed values
 * @returns the value
 * @example requireOneOf("drum", "x", ["drum", "solid-disc"]) // "drum"
 */
export function requireOneOf<T extends string>(value: unknown, name: string, options: readonly T[]): T {
  if (typeof value !== "string" || !(options as readonly string[]).includes(value)) {
    throw new TypeError(`${name} must be one of: ${options.join(", ")}`);
  }
  return value as T;
}

/**
 * Require a non-null object.
 * @param value the value
 * @param name the field's path
 * @returns the value
 * @example requireObject({}, "x") // {}
 */
export function requireObject(value: unknown, name: string): Record<string, unknown> {
  if (typeof value !== "object" || value === null || Array.isArray(value)) {
    throw new TypeError(`${name} must be an object`);
  }
  return value as Record<string, unknown>;
}

/**
 * Require a boolean.
 * @param value the value
 * @param name the field's path
 * @returns the value
 * @example requireBoolean(true, "x") // true
 */
export function requireBoolean(value: unknown, name: string): boolean {
  if (typeof value !== "boolean") throw new TypeError(`${name} must be true or false`);
  return value;
}
