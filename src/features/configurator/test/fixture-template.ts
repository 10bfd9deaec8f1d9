import type { TemplateDetail } from "../api/template-detail";
import type { EvaluationView } from "../api/evaluate";

/**
 * A small template in the format's shape (every parameter kind, two groups), for the configurator's tests.
 * Sizes are our own round numbers; they stand for nothing but themselves.
 */
export const fixtureTemplate: TemplateDetail = {
  id: "test-stop",
  version: "1.2.0",
  name: "Test stop",
  family: "stop",
  summary: "A template used only by the tests.",
  units: "mm",
  parameters: [
    {
      key: "jawWidth",
      label: "Jaw width",
      kind: "length",
      group: "Your vise",
      default: 100,
      min: 20,
      max: 250,
      step: 1,
      help: "Across the jaw face.",
    },
    {
      key: "jawThickness",
      label: "Jaw thickness",
      kind: "length",
      group: "Your vise",
      default: 25.4,
      min: 6,
      max: 40,
    },
    { key: "handForce", label: "Hand force", kind: "force", group: "Cam", default: 100, min: 20, max: 300 },
    { key: "leverAngle", label: "Lever angle", kind: "angle", group: "Cam", default: 30, min: 0, max: 90 },
    {
      key: "friction",
      label: "Friction coefficient",
      kind: "ratio",
      group: "Cam",
      default: 0.1,
      min: 0.05,
      max: 0.3,
    },
    { key: "holeCount", label: "Cross holes", kind: "count", group: "Cam", default: 3, min: 1, max: 6 },
    {
      key: "bodyMaterial",
      label: "Body material",
      kind: "material",
      group: "Materials",
      default: "mild-steel",
      materials: ["mild-steel", "brass"],
    },
    {
      key: "finish",
      label: "Finish",
      kind: "choice",
      group: "Materials",
      default: "plain",
      choices: ["plain", { value: "blued", label: "Cold blued" }],
    },
    { key: "chamferEdges", label: "Chamfer the edges", kind: "boolean", group: "Materials", default: true },
  ],
  materialNames: { "mild-steel": "Mild steel", brass: "Brass" },
};

export function fixtureEvaluation(over: Partial<EvaluationView> = {}): EvaluationView {
  return {
    template: { id: "test-stop", version: "1.2.0" },
    units: "mm",
    parameters: {},
    derived: {},
    analyses: {},
    checks: [],
    ok: true,
    partSummaries: [],
    cautions: [],
    ...over,
  };
}
