import type { ReactNode } from "react";
import type { CamResult } from "../api/cam-result-schema";
import { lockVerdict } from "./verdict";

/** The calculator's plain-language account of why this cam holds or slips. */
export function Explanation({ result, children }: { result: CamResult; children?: ReactNode }) {
  const verdict = lockVerdict(result);
  return (
    <section aria-labelledby="why-heading" className="rounded-lg border border-steel-200 bg-white p-4">
      <h2 id="why-heading" className="text-xl">
        {verdict.tone === "fault"
          ? "Why it does not lock"
          : verdict.tone === "caution"
            ? "Why it only just locks"
            : "Why it locks"}
      </h2>
      <div className="mt-2 grid gap-6 xl:grid-cols-[3fr_2fr]">
        <div>
          <p className="max-w-prose leading-relaxed text-steel-800" data-testid="cam-explanation">
            {result.explanation}
          </p>
          <p className="mt-2 text-sm text-steel-600">
            The explanation works in millimetres and newtons, whatever units are shown.
          </p>
        </div>
        {children}
      </div>
    </section>
  );
}
