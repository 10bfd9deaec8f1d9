import { cn } from "./cn";

/** A turning cam for "working on it"; the label is what screen readers hear. */
export function Spinner({ label = "Loading", className }: { label?: string; className?: string }) {
  return (
    <span role="status" className={cn("inline-flex items-center gap-2 text-steel-600", className)}>
      <svg viewBox="0 0 24 24" className="size-5 animate-spin motion-reduce:animate-none" aria-hidden="true">
        <circle
          cx="12"
          cy="12"
          r="9"
          fill="none"
          stroke="currentColor"
          strokeOpacity="0.25"
          strokeWidth="3"
        />
        <path
          d="M12 3a9 9 0 0 1 9 9"
          fill="none"
          stroke="var(--color-spark-500)"
          strokeWidth="3"
          strokeLinecap="round"
        />
      </svg>
      <span>{label}…</span>
    </span>
  );
}
