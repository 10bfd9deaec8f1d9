import { LogoMark } from "./logo-mark";

/** The foot of every page, carrying the safety note that applies to every figure Jigwright shows. */
export function SiteFooter() {
  return (
    <footer className="mt-16 border-t border-steel-200 bg-steel-100">
      <div className="mx-auto flex max-w-6xl flex-col gap-4 px-4 py-6 sm:flex-row sm:items-start">
        <LogoMark className="size-8 shrink-0 text-steel-500" />
        <div className="space-y-2 text-sm text-steel-700">
          <p>
            <strong className="text-steel-900">Safety:</strong> figures are estimates from the dimensions,
            materials and friction you enter, not guarantees. Check every setup on the machine before cutting,
            and follow the machine maker&apos;s guidance, local regulations and your shop&apos;s own practice.
          </p>
          <p>
            Jigwright: parametric templates, checks and drawings for the accessories a small shop makes for
            itself.
          </p>
        </div>
      </div>
    </footer>
  );
}
