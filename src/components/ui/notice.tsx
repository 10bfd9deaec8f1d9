import type { ReactNode } from "react";
import { cn } from "./cn";

export type NoticeTone = "info" | "holds" | "caution" | "fault";

const tones: Record<NoticeTone, string> = {
  info: "border-steel-300 bg-white text-steel-800",
  holds: "border-holds-600 bg-holds-50 text-holds-700",
  caution: "border-caution-700 bg-caution-50 text-caution-700",
  fault: "border-fault-700 bg-fault-50 text-fault-700",
};

/**
 * A boxed message. Faults use `role="alert"` so screen readers announce them when they appear;
 * the rest are polite status messages.
 */
export function Notice({
  tone = "info",
  title,
  children,
  className,
}: {
  tone?: NoticeTone;
  title?: ReactNode;
  children?: ReactNode;
  className?: string;
}) {
  return (
    <div
      role={tone === "fault" ? "alert" : "status"}
      className={cn("rounded-md border-l-4 border px-4 py-3", tones[tone], className)}
    >
      {title ? <p className="font-semibold">{title}</p> : null}
      {children ? <div className={cn(title ? "mt-1" : undefined, "text-steel-800")}>{children}</div> : null}
    </div>
  );
}
