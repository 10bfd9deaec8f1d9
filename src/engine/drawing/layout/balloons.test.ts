/**
 * Item balloons (ISO 6433: circle, item number, thin leader ending in a dot on the part) laid out so a
 * reader can follow every leader: no two leaders cross, none runs through another balloon, and the
 * balloons in the row do not overlap. The segment test itself is checked on hand-made cases.
 */
import { describe, expect, it } from "vitest";
import { BALLOON_RADIUS_MM, leaderOf, placeBalloons, segmentsIntersect, type BalloonAnchor } from "./balloons";

/** A fixed pseudo-random sequence (Park–Miller), so the cases are the same on every run. */
function sequence(seed: number): () => number {
  let s = seed;
  return () => {
    s = (s * 48271) % 2147483647;
    return s / 2147483647;
  };
}

function distanceToSegment(a: { x: number; y: number }, b: { x: number; y: number }, c: { x: number; y: number }): number {
  const dx = b.x - a.x;
  const dy = b.y - a.y;
  const t = Math.max(0, Math.min(1, ((c.x - a.x) * dx + (c.y - a.y) * dy) / (dx * dx + dy * dy)));
  return Math.hypot(a.x + t * dx - c.x, a.y + t * dy - c.y);
}

describe("segment intersection", () => {
  it("crossing, touching, parallel and apart", () => {
    const p = (x: number, y: number) => ({ x, y });
    expect(segmentsIntersect(p(0, 0), p(10, 10), p(0, 10), p(10, 0))).toBe(true);
    expect(segmentsIntersect(p(0, 0), p(10, 0), p(5, 0), p(5, 5))).toBe(true);
    expect(segmentsIntersect(p(0, 0), p(10, 0), p(0, 1), p(10, 1))).toBe(false);
    expect(segmentsIntersect(p(0, 0), p(4, 4), p(5, 5), p(9, 0))).toBe(false);
  });
});

describe("balloon layout", () => {
  const box = { minX: 0, minY: 0, maxX: 120, maxY: 50 };
  const cases: BalloonAnchor[][] = [];
  for (let seed = 1; seed <= 40; seed++) {
    const next = sequence(seed * 7919);
    const n = 2 + Math.floor(next() * 9);
    cases.push(Array.from({ length: n }, (_, i) => ({ item: i + 1, x: 5 + next() * 110, y: 2 + next() * 46 })));
  }
  // Anchors in a column (parts stacked on one axis), where sorting by x alone says nothing.
  cases.push(Array.from({ length: 6 }, (_, i) => ({ item: i + 1, x: 60 + (i % 2) * 0.5, y: 5 + i * 8 })));
  // A tight cluster near the top left: the row spreads far to the right and the outer leaders run shallow.
  cases.push(Array.from({ length: 10 }, (_, i) => ({ item: i + 1, x: 5 + i * 0.6, y: 49 - i * 0.4 })));

  it("no two leaders cross, in any of the cases", () => {
    for (const anchors of cases) {
      const placed = placeBalloons(anchors, box);
      for (let i = 0; i < placed.length; i++)
        for (let j = i + 1; j < placed.length; j++) {
          const [a1, a2] = leaderOf(placed[i]!);
          const [b1, b2] = leaderOf(placed[j]!);
          expect(segmentsIntersect(a1, a2, b1, b2), `items ${placed[i]!.item} and ${placed[j]!.item} of ${JSON.stringify(anchors)}`).toBe(false);
        }
    }
  });

  it("no leader runs through another balloon, balloons keep apart and sit above the view", () => {
    for (const anchors of cases) {
      const placed = placeBalloons(anchors, box);
      expect(placed.map((b) => b.item).sort((a, b) => a - b)).toEqual(anchors.map((a) => a.item).sort((a, b) => a - b));
      for (const b of placed) {
        expect(b.centre.y - BALLOON_RADIUS_MM).toBeGreaterThan(box.maxY);
        const [from, to] = leaderOf(b);
        for (const o of placed) {
          if (o === b) continue;
          expect(distanceToSegment(from, to, o.centre)).toBeGreaterThan(BALLOON_RADIUS_MM);
          expect(Math.hypot(o.centre.x - b.centre.x, o.centre.y - b.centre.y)).toBeGreaterThanOrEqual(2 * BALLOON_RADIUS_MM);
        }
      }
    }
  });

  it("each leader ends on its own anchor", () => {
    const anchors = cases[0]!;
    for (const b of placeBalloons(anchors, box)) {
      const a = anchors.find((x) => x.item === b.item)!;
      expect(leaderOf(b)[1]).toEqual({ x: a.x, y: a.y });
    }
  });
});
