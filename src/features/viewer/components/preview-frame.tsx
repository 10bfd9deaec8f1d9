import type { ReactNode } from "react";

/**
 * The 3D preview's box: heading, status, toolbar and a fixed-ratio stage. The placeholder shown while the
 * viewer's code loads uses the same frame, so nothing on the page moves when it arrives.
 */
export function PreviewFrame({
  toolbar,
  status,
  children,
}: {
  toolbar?: ReactNode;
  status?: ReactNode;
  children: ReactNode;
}) {
  return (
    <section
      aria-labelledby="preview-heading"
      className="rounded-lg border border-steel-200 bg-white p-4 shadow-sm"
    >
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h2 id="preview-heading" className="text-xl">
          3D preview
        </h2>
        <div aria-live="polite" className="min-h-6">
          {status}
        </div>
      </div>
      <div className="mt-2 min-h-10">{toolbar}</div>
      <div className="relative mt-3 aspect-[4/3] w-full overflow-hidden rounded-md border border-steel-200 bg-gradient-to-b from-steel-50 to-steel-200 sm:aspect-[16/10]">
        {children}
      </div>
      <p className="mt-2 text-sm text-steel-600">
        Drag to turn, scroll or pinch to zoom, right-drag or two fingers to pan; the buttons do the same from
        the keyboard.
      </p>
    </section>
  );
}
