import { lazy, Suspense } from "react";
import { Spinner } from "@/components/ui/spinner";
import type { ModelViewerProps } from "./model-viewer";
import { PreviewFrame } from "./preview-frame";

/** three.js, react-three-fiber and drei arrive in their own chunk, after the page is already usable. */
const ModelViewer = lazy(() => import("./model-viewer"));

export function ViewerPlaceholder() {
  return (
    <PreviewFrame>
      <div className="flex h-full items-center justify-center">
        <Spinner label="Loading the 3D preview" />
      </div>
    </PreviewFrame>
  );
}

/** The 3D preview, loaded lazily; a same-size placeholder stands in until its code arrives. */
export function LazyModelViewer(props: ModelViewerProps) {
  return (
    <Suspense fallback={<ViewerPlaceholder />}>
      <ModelViewer {...props} />
    </Suspense>
  );
}
