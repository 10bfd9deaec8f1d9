import type { DesignParameterValue } from "@/shared/designs";

/** "jawWidth" → "Jaw width", "m4ThreadDepth" → "M4 thread depth": a readable name for a parameter key. */
export function humaniseKey(key: string): string {
  const words = key.replace(/([a-z0-9])([A-Z])/g, "$1 $2").toLowerCase();
  return words.charAt(0).toUpperCase() + words.slice(1);
}

const numberFormat = new Intl.NumberFormat(undefined, { maximumFractionDigits: 4 });

/** A parameter value as text: numbers to at most 4 decimals, true/false as yes/no. */
export function formatValue(value: DesignParameterValue): string {
  if (typeof value === "number") return numberFormat.format(value);
  if (typeof value === "boolean") return value ? "yes" : "no";
  return value;
}

const dateFormat = new Intl.DateTimeFormat(undefined, {
  year: "numeric",
  month: "short",
  day: "numeric",
  hour: "2-digit",
  minute: "2-digit",
});

export function formatWhen(iso: string): string {
  return dateFormat.format(new Date(iso));
}
