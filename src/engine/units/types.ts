/**
 * Branded unit types: a length in millimetres cannot be passed where inches are expected without a
 * conversion, because the compiler sees different types. The brand exists only at compile time.
 */
declare const unitBrand: unique symbol;
type Brand<U extends string> = number & { readonly [unitBrand]: U };

export type Mm = Brand<"mm">;
export type Inch = Brand<"in">;
export type Deg = Brand<"deg">;
export type Newton = Brand<"N">;
export type PoundForce = Brand<"lbf">;
export type Mm3 = Brand<"mm3">;
export type Kg = Brand<"kg">;

export const asMm = (value: number) => value as Mm;
export const asInch = (value: number) => value as Inch;
export const asDeg = (value: number) => value as Deg;
export const asNewton = (value: number) => value as Newton;
export const asPoundForce = (value: number) => value as PoundForce;
export const asMm3 = (value: number) => value as Mm3;
export const asKg = (value: number) => value as Kg;

/** The two length systems a user or a template can work in. */
export type LengthUnit = "mm" | "in";
