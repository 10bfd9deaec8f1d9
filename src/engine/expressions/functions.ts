/**
 * The whitelisted functions and constants of template expressions. Nothing else can be called.
 *
 * Angles are in DEGREES at the surface (templates speak shop language): `sin(30)` is 0.5, `atan2(1, 1)` is
 * 45. Multiples of 30° and 45° come back exact where the exact value is representable (sin 30 = 0.5,
 * cos 90 = 0, tan 45 = 1), so a template can compare them without a tolerance.
 */

export interface FunctionSpec {
  minArgs: number;
  /** `Infinity` for variadic functions. */
  maxArgs: number;
  /** Receives finite numbers (checked by the caller); returns a number the caller checks for finiteness. */
  apply(args: readonly number[], factors: UnitFactors): number;
  /** Reason the argument is out of the function's domain, or undefined when fine. */
  domain?(args: readonly number[]): string | undefined;
}

/** The template's own length unit relative to millimetres, for `toMm()` / `fromMm()`. */
export interface UnitFactors {
  /** Millimetres per template length unit: 1 for a mm template, 25.4 for an inch template. */
  mmPerTemplateUnit: number;
}

const DEG = Math.PI / 180;

/** sin of an angle in degrees, exact at multiples of 30° and 90°. */
export function sinDeg(angleDeg: number): number {
  const a = ((angleDeg % 360) + 360) % 360;
  const exact: Record<number, number> = { 0: 0, 30: 0.5, 90: 1, 150: 0.5, 180: 0, 210: -0.5, 270: -1, 330: -0.5 };
  const hit = exact[a];
  return hit !== undefined ? hit : Math.sin(a * DEG);
}

/** cos of an angle in degrees, exact at multiples of 60° and 90°. */
export function cosDeg(angleDeg: number): number {
  return sinDeg(angleDeg + 90);
}

/** tan of an angle in degrees; exact at multiples of 45°; refuses odd multiples of 90° (infinite). */
export function tanDeg(angleDeg: number): number {
  const a = ((angleDeg % 180) + 180) % 180;
  if (a === 0) return 0;
  if (a === 45) return 1;
  if (a === 135) return -1;
  return Math.tan(a * DEG);
}

/**
 * Rounds half away from zero to `digits` decimals (0–12), working on the decimal text so that
 * `round(2.675, 2)` gives 2.68 as a machinist expects, not 2.67 from binary noise.
 */
export function roundTo(value: number, digits = 0): number {
  const sign = value < 0 ? -1 : 1;
  const shifted = Number(`${Math.abs(value)}e${digits}`);
  const rounded = Math.round(shifted);
  return sign * Number(`${rounded}e${-digits}`);
}

const one = (apply: (x: number) => number, domain?: (x: number) => string | undefined): FunctionSpec => ({
  minArgs: 1,
  maxArgs: 1,
  apply: (args) => apply(args[0]!),
  ...(domain ? { domain: (args: readonly number[]) => domain(args[0]!) } : {}),
});

const unitInterval = (name: string) => (x: number) => (x < -1 || x > 1 ? `${name} needs a value between -1 and 1, got ${x}` : undefined);

/** The whole list. Keys are the names a template may call. */
export const FUNCTIONS: Readonly<Record<string, FunctionSpec>> = Object.freeze({
  min: { minArgs: 1, maxArgs: Infinity, apply: (a) => Math.min(...a) },
  max: { minArgs: 1, maxArgs: Infinity, apply: (a) => Math.max(...a) },
  abs: one(Math.abs),
  sqrt: one(Math.sqrt, (x) => (x < 0 ? `sqrt of a negative number (${x})` : undefined)),
  round: {
    minArgs: 1,
    maxArgs: 2,
    apply: (a) => roundTo(a[0]!, a[1] ?? 0),
    domain: (a) => (a[1] !== undefined && (!Number.isInteger(a[1]) || a[1] < 0 || a[1] > 12) ? `round digits must be a whole number 0–12, got ${a[1]}` : undefined),
  },
  ceil: one(Math.ceil),
  floor: one(Math.floor),
  sin: one(sinDeg),
  cos: one(cosDeg),
  tan: one(tanDeg, (x) => (Math.abs((((x % 180) + 180) % 180) - 90) < 1e-12 ? `tan of ${x}° is infinite` : undefined)),
  asin: one((x) => Math.asin(x) / DEG, unitInterval("asin")),
  acos: one((x) => Math.acos(x) / DEG, unitInterval("acos")),
  atan: one((x) => Math.atan(x) / DEG),
  atan2: {
    minArgs: 2,
    maxArgs: 2,
    apply: (a) => Math.atan2(a[0]!, a[1]!) / DEG,
    domain: (a) => (a[0] === 0 && a[1] === 0 ? "atan2(0, 0) has no direction" : undefined),
  },
  hypot: { minArgs: 1, maxArgs: Infinity, apply: (a) => Math.hypot(...a) },
  /** A length in the template's units → millimetres (identity in a mm template). For calculator inputs. */
  toMm: { minArgs: 1, maxArgs: 1, apply: (a, f) => a[0]! * f.mmPerTemplateUnit },
  /** Millimetres (e.g. a calculator's `throwMm`) → the template's length unit. */
  fromMm: { minArgs: 1, maxArgs: 1, apply: (a, f) => a[0]! / f.mmPerTemplateUnit },
});

/** Named constants. */
export const CONSTANTS: Readonly<Record<string, number>> = Object.freeze({ pi: Math.PI });

/** Names a parameter, derived value or analysis may not take (they would shadow a function or constant). */
export const RESERVED_NAMES: ReadonlySet<string> = new Set([...Object.keys(FUNCTIONS), ...Object.keys(CONSTANTS), "true", "false", "and", "or", "not", "xor", "mod", "to", "in", "null", "undefined", "Infinity", "NaN"]);

export function isFunctionName(name: string): boolean {
  return Object.prototype.hasOwnProperty.call(FUNCTIONS, name);
}
