import { useId, type InputHTMLAttributes, type ReactNode, type Ref } from "react";
import { cn } from "./cn";

export interface TextFieldProps extends Omit<InputHTMLAttributes<HTMLInputElement>, "id"> {
  label: string;
  /** Shown under the label; linked to the input for screen readers. */
  hint?: ReactNode;
  /** The field's problem, shown in place of nothing; marks the input invalid. */
  error?: string | undefined;
  ref?: Ref<HTMLInputElement>;
}

/** A labelled input with its hint and error message, wired up with aria attributes. */
export function TextField({ label, hint, error, className, ref, ...rest }: TextFieldProps) {
  const id = useId();
  const hintId = hint ? `${id}-hint` : undefined;
  const errorId = error ? `${id}-error` : undefined;
  return (
    <div className={cn("flex flex-col gap-1", className)}>
      <label htmlFor={id} className="font-semibold text-steel-900">
        {label}
      </label>
      {hint ? (
        <p id={hintId} className="text-sm text-steel-600">
          {hint}
        </p>
      ) : null}
      <input
        id={id}
        ref={ref}
        aria-invalid={error ? true : undefined}
        aria-describedby={[hintId, errorId].filter(Boolean).join(" ") || undefined}
        className={cn(
          "min-h-11 rounded-md border bg-white px-3 py-2 text-base text-steel-950 shadow-inner",
          "placeholder:text-steel-400 focus-visible:outline-spark-500",
          error ? "border-fault-700" : "border-steel-300 hover:border-steel-400",
        )}
        {...rest}
      />
      {error ? (
        <p id={errorId} className="flex items-start gap-1 text-sm font-medium text-fault-700">
          <span aria-hidden="true">▲</span>
          {error}
        </p>
      ) : null}
    </div>
  );
}
