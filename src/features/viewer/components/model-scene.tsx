import { useEffect, useLayoutEffect, useMemo, useRef } from "react";
import { Edges, OrbitControls } from "@react-three/drei";
import { useThree } from "@react-three/fiber";
import { Box3, type Group, type PerspectiveCamera, Vector3 } from "three";
import type { OrbitControls as OrbitControlsImpl } from "three-stdlib";
import type { PreviewFixture, PreviewModel, PreviewPart } from "../api/model-schema";
import {
  edgeGeometry,
  fitCamera,
  fixtureCentre,
  matrixOf,
  viewDirections,
  type ViewName,
} from "../scene/geometry";
import { partGeometry } from "../scene/geometry";

/** A request to move the camera: fit the visible parts from a view (or the current direction), or turn about the up axis. */
export type CameraCommand =
  { id: number; kind: "fit"; view?: ViewName } | { id: number; kind: "turn"; degrees: number };

function PartMesh({ part, exploded }: { part: PreviewPart; exploded: boolean }) {
  const geometry = useMemo(() => partGeometry(part), [part]);
  const edges = useMemo(() => edgeGeometry(part), [part]);
  useEffect(
    () => () => {
      geometry.dispose();
      edges?.dispose();
    },
    [geometry, edges],
  );
  const matrix = useMemo(() => matrixOf(exploded ? part.exploded : part.assembly), [part, exploded]);
  return (
    <group matrixAutoUpdate={false} matrix={matrix} name={part.id}>
      <mesh geometry={geometry}>
        <meshStandardMaterial
          color={part.colour}
          metalness={0.15}
          roughness={0.55}
          polygonOffset
          polygonOffsetFactor={1}
          polygonOffsetUnits={1}
        />
      </mesh>
      {edges ? (
        <lineSegments geometry={edges}>
          <lineBasicMaterial color="#1d2226" />
        </lineSegments>
      ) : null}
    </group>
  );
}

/** The vise jaw (or other fixture) the accessory sits on, ghosted so the part stays readable. */
function FixtureGhost({ fixture }: { fixture: PreviewFixture }) {
  const { sizeMm: s } = fixture;
  return (
    <mesh position={fixtureCentre(fixture)} renderOrder={-1}>
      <boxGeometry args={[s.x, s.y, s.z]} />
      <meshStandardMaterial color="#7d93a8" transparent opacity={0.18} depthWrite={false} />
      <Edges color="#505b64" />
    </mesh>
  );
}

/**
 * The scene: lights, the parts in their assembly (or exploded) placement, the ghosted fixture, orbit
 * controls with z up, and the camera commands (fit, views, turns) the toolbar sends.
 */
export function ModelScene({
  model,
  exploded,
  onlyPart,
  showFixture,
  command,
}: {
  model: PreviewModel;
  exploded: boolean;
  onlyPart: string | null;
  showFixture: boolean;
  command: CameraCommand;
}) {
  const group = useRef<Group>(null);
  const controls = useRef<OrbitControlsImpl>(null);
  const camera = useThree((s) => s.camera) as PerspectiveCamera;
  const size = useThree((s) => s.size);
  const invalidate = useThree((s) => s.invalidate);
  const parts = onlyPart ? model.parts.filter((p) => p.id === onlyPart) : model.parts;
  const fixtures = showFixture && !onlyPart ? model.fixtures : [];

  useLayoutEffect(() => {
    const target = controls.current?.target;
    if (!group.current || !target) return;
    if (command.kind === "turn") {
      const offset = camera.position.clone().sub(target);
      offset.applyAxisAngle(new Vector3(0, 0, 1), (command.degrees * Math.PI) / 180);
      camera.position.copy(target).add(offset);
      camera.lookAt(target);
    } else {
      group.current.updateMatrixWorld(true);
      const box = new Box3().setFromObject(group.current);
      const direction = command.view
        ? viewDirections[command.view]
        : camera.position.clone().sub(target).normalize();
      // Frame the parts (the ghosted jaw may run past the edges, as in a photograph of the real set-up).
      const centre = fitCamera(camera, box, direction.lengthSq() > 0 ? direction : viewDirections.iso, 1.25);
      if (centre) target.copy(centre);
    }
    controls.current?.update();
    invalidate();
    // Each command runs once, when it arrives (its id changes); the canvas size is read at that moment.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [command.id]);

  useEffect(() => invalidate(), [size.width, size.height, invalidate]);

  return (
    <>
      <hemisphereLight args={["#ffffff", "#66727c", 1.6]} position={[0, 0, 1]} />
      <directionalLight position={[300, -400, 600]} intensity={2.6} />
      <directionalLight position={[-400, 300, 200]} intensity={1} />
      <group ref={group}>
        {parts.map((p) => (
          <PartMesh key={p.id} part={p} exploded={exploded} />
        ))}
      </group>
      {fixtures.map((f) => (
        <FixtureGhost key={f.id} fixture={f} />
      ))}
      <OrbitControls ref={controls} makeDefault enableDamping={false} />
    </>
  );
}
