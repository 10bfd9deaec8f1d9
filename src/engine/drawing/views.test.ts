/**
 * Which views a part sheet draws: the part's own list, else the template's `drawing.views`, else the
 * engine's default (three views for a prismatic part, front and end view for a turned one — common
 * practice), with the front view always drawn as the principal view (ISO 5456-2 §5).
 */
import { describe, expect, it } from "vitest";
import type { ResolvedPart } from "../parts/features";
import { viewsForPart } from "./views";

const block: ResolvedPart = { id: "b", name: "Block", material: "mild-steel", features: [{ kind: "block", size: { x: 40, y: 20, z: 10 } }] };
const turned: ResolvedPart = { id: "t", name: "Pin", material: "mild-steel", features: [{ kind: "turned", steps: [{ diameter: 10, length: 20 }] }] };
const names = (part: ResolvedPart, template?: Parameters<typeof viewsForPart>[1]) => viewsForPart(part, template).map((v) => v.name);

describe("views drawn per part", () => {
  it("without any choice: front, top and right for a block; front and the end view for a turned part", () => {
    expect(names(block)).toEqual(["front", "top", "right"]);
    expect(names(turned)).toEqual(["front", "right"]);
  });
  it("the template's drawing.views applies to parts that do not list their own", () => {
    expect(names(block, ["front", "top"])).toEqual(["front", "top"]);
    expect(names(turned, ["front", "left"])).toEqual(["front", "left"]);
  });
  it("a part's own list wins over the template's", () => {
    const own: ResolvedPart = { ...block, drawing: { views: ["front", "right"] } };
    expect(names(own, ["front", "top", "left"])).toEqual(["front", "right"]);
  });
  it("the front view is added first when a list leaves it out, and repeats are dropped", () => {
    expect(names(block, ["top", "top", "right"])).toEqual(["front", "top", "right"]);
  });
  it("an empty template list is no choice", () => {
    expect(names(block, [])).toEqual(["front", "top", "right"]);
  });
});
