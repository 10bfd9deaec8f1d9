import { describe, expect, it } from "vitest";
import { decodeModel, modelResponseSchema } from "./model-schema";

/** base64 of little-endian bytes, made with Node's Buffer (independent of the decoder under test). */
const b64 = (array: Float32Array | Uint32Array) =>
  Buffer.from(array.buffer, array.byteOffset, array.byteLength).toString("base64");

describe("3D preview data from the model route", () => {
  it("decodes base64 little-endian Float32/Uint32 arrays and keeps the placement matrices", () => {
    const positions = new Float32Array([0, 0, 0, 10, 0, 0, 0, 12.5, 0]);
    const normals = new Float32Array([0, 0, 1, 0, 0, 1, 0, 0, 1]);
    const indices = new Uint32Array([0, 1, 2]);
    const assembly = [1, 0, 0, 0, 0, 1, 0, 0, 0, 0, 1, 0, 5, 6, 7, 1];
    const response = modelResponseSchema.parse({
      template: { id: "t", version: "1.0.0" },
      parts: [
        {
          id: "body",
          name: "Body",
          colour: "#8d99a3",
          mesh: { positions: b64(positions), normals: b64(normals), indices: b64(indices), edges: "" },
          assembly,
          exploded: [1, 0, 0, 0, 0, 1, 0, 0, 0, 0, 1, 0, 5, 6, 17, 1],
        },
      ],
      fixtures: [
        {
          id: "jaw",
          label: "Fixed jaw",
          positionMm: { x: 0, y: 0, z: -30 },
          sizeMm: { x: 100, y: 20, z: 30 },
        },
      ],
    });
    const model = decodeModel(response);
    const part = model.parts[0]!;
    expect([...part.positions]).toEqual([0, 0, 0, 10, 0, 0, 0, 12.5, 0]);
    expect([...part.indices]).toEqual([0, 1, 2]);
    expect(part.normals?.length).toBe(9);
    expect(part.edges).toBeNull();
    expect(part.assembly).toEqual(assembly);
    expect(part.exploded[14]).toBe(17);
    expect(model.fixtures[0]).toMatchObject({ label: "Fixed jaw", sizeMm: { x: 100, y: 20, z: 30 } });
  });

  it("falls back to the assembly placement and a steel grey when the server leaves them out", () => {
    const model = decodeModel(
      modelResponseSchema.parse({ parts: [{ id: "p", mesh: { positions: [0, 0, 0], indices: [0] } }] }),
    );
    expect(model.parts[0]!.colour).toBe("#9aa5ae");
    expect(model.parts[0]!.exploded).toEqual(model.parts[0]!.assembly);
    expect(model.fixtures).toEqual([]);
  });
});
