/**
 * Arrangement of views by the projection method (ISO 5456-2 §5):
 *  - first angle: the view from above goes below the front view, the view from below above it, the view
 *    from the left on the right, the view from the right on the left;
 *  - third angle: each view goes on the side it is seen from (above on top, right on the right).
 * The rear view goes at the far right in both. Views in the front view's column share its x origin and
 * views in its row share its y origin, so projection lines run straight between them.
 */
import type { ViewName } from "../projection";
import { emptyBox, unionBox, type Box } from "./geometry";

export type ProjectionMethod = "first" | "third";

/** Clear space between the envelopes of neighbouring views, sheet mm. */
export const VIEW_GAP_MM = 10;

const GRID: Record<ProjectionMethod, Record<ViewName, [number, number]>> = {
  first: { front: [0, 0], top: [0, -1], bottom: [0, 1], left: [1, 0], right: [-1, 0], rear: [2, 0] },
  third: { front: [0, 0], top: [0, 1], bottom: [0, -1], right: [1, 0], left: [-1, 0], rear: [2, 0] },
};

export interface Arranged {
  /** Offset of each view's origin, sheet mm. */
  offsets: Map<ViewName, { dx: number; dy: number }>;
  /** Extent of all envelopes after moving. */
  box: Box;
}

const shift = (b: Box, dx: number, dy: number): Box => ({ minX: b.minX + dx, maxX: b.maxX + dx, minY: b.minY + dy, maxY: b.maxY + dy });

export function arrangeViews(envelopes: Map<ViewName, Box>, method: ProjectionMethod): Arranged {
  const grid = GRID[method];
  const at = (col: number, row: number) => [...envelopes.keys()].filter((n) => grid[n][0] === col && grid[n][1] === row);
  const offsets = new Map<ViewName, { dx: number; dy: number }>();
  const column0 = [...envelopes.keys()].filter((n) => grid[n][0] === 0).map((n) => envelopes.get(n)!);
  const row0 = [...envelopes.keys()].filter((n) => grid[n][1] === 0).map((n) => envelopes.get(n)!);
  const col0Box = column0.reduce(unionBox, emptyBox());
  const row0Box = row0.reduce(unionBox, emptyBox());
  for (const n of at(0, 0)) offsets.set(n, { dx: 0, dy: 0 });
  // Row 0, to the right: each column starts a gap after the previous one.
  let right = col0Box.maxX;
  for (const col of [1, 2]) {
    for (const n of at(col, 0)) {
      const e = envelopes.get(n)!;
      const dx = right + VIEW_GAP_MM - e.minX;
      offsets.set(n, { dx, dy: 0 });
      right = e.maxX + dx;
    }
  }
  for (const n of at(-1, 0)) {
    const e = envelopes.get(n)!;
    offsets.set(n, { dx: col0Box.minX - VIEW_GAP_MM - e.maxX, dy: 0 });
  }
  for (const n of at(0, 1)) {
    const e = envelopes.get(n)!;
    offsets.set(n, { dx: 0, dy: row0Box.maxY + VIEW_GAP_MM - e.minY });
  }
  for (const n of at(0, -1)) {
    const e = envelopes.get(n)!;
    offsets.set(n, { dx: 0, dy: row0Box.minY - VIEW_GAP_MM - e.maxY });
  }
  let box = emptyBox();
  for (const [n, o] of offsets) box = unionBox(box, shift(envelopes.get(n)!, o.dx, o.dy));
  return { offsets, box };
}
