/**
 * Unit systems for the cam check. The calculator works in mm, N and N·m; the inch system shows inches,
 * pounds-force and pound-force inches.
 *
 * Exact factors by definition: 1 in = 25.4 mm (international yard and pound agreement, 1959);
 * 1 lbf = 0.45359237 kg × 9.80665 m/s² = 4.4482216152605 N (NIST SP 811, appendix B).
 */
export type UnitSystem = "mm" | "inch";

export const MM_PER_INCH = 25.4;
export const N_PER_LBF = 0.45359237 * 9.80665;
/** 1 lbf·in = 4.4482216152605 N × 0.0254 m. */
export const NM_PER_LBF_IN = N_PER_LBF * 0.0254;

export type Quantity = "length" | "force" | "torque" | "coefficient" | "angle";

interface UnitInfo {
  symbol: string;
  /** Multiply a calculator value (mm, N, N·m) by this to get the shown value. */
  fromBase: number;
  /** Decimals shown for results and after converting an input in place. */
  decimals: number;
}

const table: Record<UnitSystem, Record<Quantity, UnitInfo>> = {
  mm: {
    length: { symbol: "mm", fromBase: 1, decimals: 3 },
    force: { symbol: "N", fromBase: 1, decimals: 1 },
    torque: { symbol: "N·m", fromBase: 1, decimals: 2 },
    coefficient: { symbol: "", fromBase: 1, decimals: 3 },
    angle: { symbol: "°", fromBase: 1, decimals: 1 },
  },
  inch: {
    length: { symbol: "in", fromBase: 1 / MM_PER_INCH, decimals: 4 },
    force: { symbol: "lbf", fromBase: 1 / N_PER_LBF, decimals: 2 },
    torque: { symbol: "lbf·in", fromBase: 1 / NM_PER_LBF_IN, decimals: 1 },
    coefficient: { symbol: "", fromBase: 1, decimals: 3 },
    angle: { symbol: "°", fromBase: 1, decimals: 1 },
  },
};

export function unitOf(system: UnitSystem, quantity: Quantity): UnitInfo {
  return table[system][quantity];
}

/** A calculator value (mm, N, N·m) in the shown unit. */
export function toShown(system: UnitSystem, quantity: Quantity, base: number): number {
  return base * table[system][quantity].fromBase;
}

/** A shown value back to the calculator's unit. */
export function toBase(system: UnitSystem, quantity: Quantity, shown: number): number {
  return shown / table[system][quantity].fromBase;
}

/** Rounds to `decimals` and drops trailing zeros: 25.400 → "25.4", 1.00000 → "1". */
export function trimNumber(value: number, decimals: number): string {
  const s = value.toFixed(decimals);
  return s.includes(".") ? s.replace(/\.?0+$/, "") : s;
}

/** A calculator value, shown with its unit symbol: "1628 N", "0.0472 in". */
export function formatQuantity(
  system: UnitSystem,
  quantity: Quantity,
  base: number,
  decimals?: number,
): string {
  const info = table[system][quantity];
  const text = trimNumber(toShown(system, quantity, base), decimals ?? info.decimals);
  if (!info.symbol) return text;
  return info.symbol === "°" ? `${text}°` : `${text} ${info.symbol}`;
}
