import { useEffect, type ReactNode } from "react";
import { cn } from "@/components/ui/cn";

/** A page body with its title; also sets the document title so tabs and history read well. */
export function Page({
  title,
  lead,
  children,
  className,
  width = "wide",
}: {
  title: string;
  lead?: ReactNode;
  children?: ReactNode;
  className?: string;
  width?: "narrow" | "wide";
}) {
  useEffect(() => {
    document.title = `${title} · Jigwright`;
  }, [title]);
  return (
    <div className={cn("mx-auto px-4 py-8", width === "narrow" ? "max-w-md" : "max-w-6xl", className)}>
      <h1 className="text-3xl sm:text-4xl">{title}</h1>
      {lead ? <p className="mt-2 max-w-3xl text-lg text-steel-700">{lead}</p> : null}
      <div className="mt-6">{children}</div>
    </div>
  );
}
