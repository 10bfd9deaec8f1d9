import { Component, useEffect, useRef, useState, type ReactNode } from "react";
import { Canvas } from "@react-three/fiber";
import { cn } from "@/components/ui/cn";
import { Spinner } from "@/components/ui/spinner";
import type { ParameterValue } from "@/engine/parameters";
import type { LengthUnit } from "@/engine/units";
import { useModel } from "../api/get-model";
import type { ViewName } from "../scene/geometry";
import { ModelScene, type CameraCommand } from "./model-scene";
import { PreviewFrame } from "./preview-frame";

export interface ModelViewerProps {
  templateId: string;
  request: { parameters: Record<string, ParameterValue>; units: LengthUnit } | null;
}

const toolButton =
  "inline-flex min-h-10 items-center gap-1.5 rounded-md border border-steel-300 bg-white px-3 text-sm font-semibold text-steel-900 hover:bg-steel-100 aria-pressed:border-steel-900 aria-pressed:bg-steel-900 aria-pressed:text-white disabled:opacity-50";

const views: Array<{ view: ViewName; label: string }> = [
  { view: "iso", label: "3D" },
  { view: "front", label: "Front" },
  { view: "side", label: "Side" },
  { view: "top", label: "Top" },
];

class CanvasBoundary extends Component<{ children: ReactNode }, { failed: boolean }> {
  override state = { failed: false };
  static getDerivedStateFromError() {
    return { failed: true };
  }
  override render() {
    if (this.state.failed) return <NoWebGl reason="The 3D preview stopped working in this browser." />;
    return this.props.children;
  }
}

function NoWebGl({ reason }: { reason: string }) {
  return (
    <div className="flex h-full items-center justify-center p-6 text-center text-steel-700">
      <p>{reason} The checks, figures and downloads below do not need it.</p>
    </div>
  );
}

/**
 * The 3D preview: the assembly on its ghosted vise jaw, orbit with the mouse or a finger, and buttons for
 * everything (fit, views, turning, explode, one part, the jaw) so it works from the keyboard too. The
 * last model stays on screen while the next configuration is built.
 */
export default function ModelViewer({ templateId, request }: ModelViewerProps) {
  const model = useModel(templateId, request);
  const [exploded, setExploded] = useState(false);
  const [onlyPart, setOnlyPart] = useState<string | null>(null);
  const [showFixture, setShowFixture] = useState(true);
  const [command, setCommand] = useState<CameraCommand>({ id: 0, kind: "fit", view: "iso" });
  const next = useRef(1);
  const send = (c: { kind: "fit"; view?: ViewName } | { kind: "turn"; degrees: number }) =>
    setCommand({ ...c, id: next.current++ });

  // The first model that arrives is fitted to the view; later ones keep the person's camera.
  const firstFit = useRef(false);
  useEffect(() => {
    if (model.data && !firstFit.current) {
      firstFit.current = true;
      setCommand({ id: next.current++, kind: "fit", view: "iso" });
    }
  }, [model.data]);

  // Exploding, picking one part or hiding the jaw changes what is visible: fit again.
  const visibleKey = `${exploded}|${onlyPart ?? ""}|${showFixture}`;
  const lastVisible = useRef(visibleKey);
  useEffect(() => {
    if (lastVisible.current === visibleKey) return;
    lastVisible.current = visibleKey;
    setCommand({ id: next.current++, kind: "fit" });
  }, [visibleKey]);

  const data = model.data;
  const parts = data?.parts ?? [];
  const shownPart = onlyPart && parts.some((p) => p.id === onlyPart) ? onlyPart : null;
  const hasFixture = (data?.fixtures.length ?? 0) > 0;

  const status = !request
    ? null
    : model.isError
      ? "error"
      : model.isFetching
        ? "updating"
        : data
          ? "current"
          : "loading";

  return (
    <PreviewFrame
      status={
        status === "updating" ? (
          <Spinner label="Updating the model" className="text-sm" />
        ) : status === "error" && data ? (
          <span className="text-sm font-semibold text-fault-700">
            Showing the last model: {model.error?.message}
          </span>
        ) : null
      }
      toolbar={
        <div className="flex flex-wrap items-center gap-2" role="toolbar" aria-label="3D preview controls">
          <button type="button" className={toolButton} disabled={!data} onClick={() => send({ kind: "fit" })}>
            Fit to view
          </button>
          <div className="inline-flex gap-1" role="group" aria-label="View from">
            {views.map((v) => (
              <button
                key={v.view}
                type="button"
                className={toolButton}
                disabled={!data}
                onClick={() => send({ kind: "fit", view: v.view })}
              >
                {v.label}
              </button>
            ))}
          </div>
          <div className="inline-flex gap-1" role="group" aria-label="Turn">
            <button
              type="button"
              className={toolButton}
              disabled={!data}
              onClick={() => send({ kind: "turn", degrees: -30 })}
              aria-label="Turn left 30°"
            >
              ⟲
            </button>
            <button
              type="button"
              className={toolButton}
              disabled={!data}
              onClick={() => send({ kind: "turn", degrees: 30 })}
              aria-label="Turn right 30°"
            >
              ⟳
            </button>
          </div>
          <button
            type="button"
            className={toolButton}
            aria-pressed={exploded}
            disabled={!data || parts.length < 2}
            onClick={() => setExploded((e) => !e)}
          >
            Exploded
          </button>
          {hasFixture ? (
            <button
              type="button"
              className={toolButton}
              aria-pressed={showFixture}
              disabled={!data || shownPart !== null}
              onClick={() => setShowFixture((s) => !s)}
            >
              Vise jaw
            </button>
          ) : null}
          <label className="inline-flex items-center gap-2 text-sm font-semibold text-steel-900">
            Show
            <select
              value={shownPart ?? ""}
              onChange={(e) => setOnlyPart(e.target.value || null)}
              disabled={!data}
              className="min-h-10 rounded-md border border-steel-300 bg-white px-2 font-normal"
            >
              <option value="">all parts</option>
              {parts.map((p) => (
                <option key={p.id} value={p.id}>
                  {p.name}
                </option>
              ))}
            </select>
          </label>
        </div>
      }
    >
      {data ? (
        <CanvasBoundary>
          <Canvas
            frameloop="demand"
            dpr={[1, 1.5]}
            camera={{ fov: 35, up: [0, 0, 1], position: [200, -260, 180], near: 1, far: 10_000 }}
            gl={{ antialias: true, preserveDrawingBuffer: true }}
            fallback={<NoWebGl reason="This browser cannot draw 3D (WebGL is off or missing)." />}
            aria-label={`3D model of ${parts.map((p) => p.name).join(", ")}${exploded ? ", exploded" : ""}`}
            role="img"
            data-testid="model-canvas"
          >
            <ModelScene
              model={data}
              exploded={exploded}
              onlyPart={shownPart}
              showFixture={showFixture}
              command={command}
            />
          </Canvas>
        </CanvasBoundary>
      ) : (
        <div
          className={cn(
            "flex h-full items-center justify-center",
            status === "error" ? "p-6 text-center" : "",
          )}
        >
          {status === "error" ? (
            <p className="text-fault-700">The model could not be built: {model.error?.message}</p>
          ) : request ? (
            <Spinner label="Building the model" />
          ) : (
            <p className="p-6 text-center text-steel-700">Fix the marked fields to see the model.</p>
          )}
        </div>
      )}
    </PreviewFrame>
  );
}
