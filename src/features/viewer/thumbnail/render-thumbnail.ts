/**
 * Catalogue pictures rendered from each template's own model: one offscreen WebGL renderer (browsers allow
 * only a handful of live contexts) draws a part set at a time and hands back a PNG data URL. Loaded only
 * through a dynamic import, so three.js never enters the catalogue's first bundle.
 */
import {
  Box3,
  BoxGeometry,
  Color,
  DirectionalLight,
  EdgesGeometry,
  Group,
  HemisphereLight,
  LineBasicMaterial,
  LineSegments,
  Mesh,
  MeshStandardMaterial,
  PerspectiveCamera,
  Scene,
  WebGLRenderer,
} from "three";
import type { PreviewModel } from "../api/model-schema";
import {
  edgeGeometry,
  fitCamera,
  fixtureCentre,
  matrixOf,
  partGeometry,
  viewDirections,
} from "../scene/geometry";

export const thumbnailSize = { width: 480, height: 300 } as const;

let renderer: WebGLRenderer | null = null;
let queue: Promise<unknown> = Promise.resolve();

function getRenderer(): WebGLRenderer {
  if (!renderer) {
    const canvas = document.createElement("canvas");
    renderer = new WebGLRenderer({ canvas, antialias: true, alpha: true, preserveDrawingBuffer: true });
    renderer.setPixelRatio(1);
    renderer.setSize(thumbnailSize.width, thumbnailSize.height, false);
  }
  return renderer;
}

function draw(model: PreviewModel): string {
  const r = getRenderer();
  const scene = new Scene();
  // Sky from +z: the assembly frame has z up.
  const sky = new HemisphereLight(0xffffff, 0x66727c, 1.6);
  sky.position.set(0, 0, 1);
  scene.add(sky);
  const key = new DirectionalLight(0xffffff, 2.6);
  key.position.set(300, -400, 600);
  scene.add(key);
  const fill = new DirectionalLight(0xffffff, 1);
  fill.position.set(-400, 300, 200);
  scene.add(fill);

  const disposables: Array<{ dispose(): void }> = [];
  const group = new Group();
  for (const part of model.parts) {
    const holder = new Group();
    holder.matrixAutoUpdate = false;
    holder.matrix.copy(matrixOf(part.assembly));
    const geometry = partGeometry(part);
    const material = new MeshStandardMaterial({
      color: new Color(part.colour),
      metalness: 0.15,
      roughness: 0.55,
      polygonOffset: true,
      polygonOffsetFactor: 1,
      polygonOffsetUnits: 1,
    });
    holder.add(new Mesh(geometry, material));
    disposables.push(geometry, material);
    const edges = edgeGeometry(part);
    if (edges) {
      const lineMaterial = new LineBasicMaterial({ color: 0x1d2226 });
      holder.add(new LineSegments(edges, lineMaterial));
      disposables.push(edges, lineMaterial);
    }
    group.add(holder);
  }
  scene.add(group);
  group.updateMatrixWorld(true);
  const partsBox = new Box3().setFromObject(group);

  for (const f of model.fixtures) {
    const box = new BoxGeometry(f.sizeMm.x, f.sizeMm.y, f.sizeMm.z);
    const material = new MeshStandardMaterial({
      color: 0x7d93a8,
      transparent: true,
      opacity: 0.18,
      depthWrite: false,
    });
    const mesh = new Mesh(box, material);
    mesh.position.set(...fixtureCentre(f));
    const outline = new EdgesGeometry(box);
    const outlineMaterial = new LineBasicMaterial({ color: 0x84909a });
    mesh.add(new LineSegments(outline, outlineMaterial));
    scene.add(mesh);
    disposables.push(box, material, outline, outlineMaterial);
  }

  const camera = new PerspectiveCamera(30, thumbnailSize.width / thumbnailSize.height, 1, 10_000);
  camera.up.set(0, 0, 1);
  // Frame the parts themselves; the ghosted jaw may run off the edge, as in a photograph of the real thing.
  fitCamera(camera, partsBox, viewDirections.iso, 1.1);
  r.setClearColor(0x000000, 0);
  r.render(scene, camera);
  const url = r.domElement.toDataURL("image/png");
  for (const d of disposables) d.dispose();
  return url;
}

/** Renders one model to a PNG data URL; renders run one after another on the shared renderer. */
export function renderThumbnail(model: PreviewModel): Promise<string> {
  const run = queue.then(() => draw(model));
  queue = run.catch(() => undefined);
  return run;
}
