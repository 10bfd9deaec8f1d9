import type { ButtonHTMLAttributes, Ref } from "react";
import { cn } from "./cn";

export type ButtonVariant = "primary" | "secondary" | "quiet" | "danger" | "onDark" | "quietOnDark";

const variants: Record<ButtonVariant, string> = {
  primary: "bg-spark-500 text-steel-950 hover:bg-spark-400 active:bg-spark-600 shadow-sm",
  secondary: "bg-white text-steel-900 border border-steel-300 hover:bg-steel-100 active:bg-steel-200",
  quiet: "bg-transparent text-steel-700 hover:bg-steel-100 hover:text-steel-950",
  danger: "bg-fault-700 text-white hover:bg-fault-700/90",
  /** For the dark header and hero band. */
  onDark: "border border-steel-500 bg-steel-800 text-white hover:bg-steel-700 active:bg-steel-600",
  quietOnDark: "bg-transparent text-steel-100 hover:bg-steel-800 hover:text-white",
};

/** The classes of a button, for links that should look like one. */
export function buttonClasses(variant: ButtonVariant = "primary", extra?: string): string {
  return cn(
    "inline-flex min-h-11 items-center justify-center gap-2 rounded-md px-4 py-2 text-base font-semibold",
    "transition-colors disabled:cursor-not-allowed disabled:opacity-60",
    variants[variant],
    extra,
  );
}

export interface ButtonProps extends ButtonHTMLAttributes<HTMLButtonElement> {
  variant?: ButtonVariant;
  ref?: Ref<HTMLButtonElement>;
}

export function Button({ variant = "primary", className, type = "button", ...rest }: ButtonProps) {
  return <button type={type} className={buttonClasses(variant, className)} {...rest} />;
}
