import { cn } from "./cn";

const roleTone: Record<string, string> = {
  admin: "bg-spark-100 text-spark-800 ring-spark-300",
  reviewer: "bg-caution-50 text-caution-700 ring-caution-300",
  designer: "bg-holds-50 text-holds-700 ring-holds-600/40",
  machinist: "bg-steel-100 text-steel-700 ring-steel-300",
};

/** A small tag naming a user's role. */
export function RoleBadge({ role, className }: { role: string; className?: string }) {
  return (
    <span
      className={cn(
        "inline-flex items-center rounded px-2 py-0.5 text-xs font-semibold uppercase tracking-wide ring-1 ring-inset",
        roleTone[role] ?? roleTone.machinist,
        className,
      )}
    >
      {role}
    </span>
  );
}
