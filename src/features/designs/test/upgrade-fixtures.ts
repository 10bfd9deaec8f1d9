/**
 * What `GET /api/designs/:id/upgrade` answers for designs on our own test template (test-step-stop
 * 1.0.0 → 2.0.0, tests/fixtures/templates; round test numbers, not reference values). The API test
 * (tests/api/design-upgrade.test.ts) checks that the server answers exactly these, and the component
 * tests feed them to the page, so the page is tested on real answers.
 */
import type { CheckChange, ParameterChange } from "@/shared/design-upgrade";
import type { Design } from "@/shared/designs";

const mm = (n: number) => ({ value: n, text: `${n} mm` });

/** A 130 mm jaw, 20 mm stop: passes the height check on 1.0.0 only, the width warning on 2.0.0 only. */
export const inRangeCheckChanges: CheckChange[] = [
  {
    id: "tall-enough",
    severity: "error",
    before: { passed: true, message: "The stop stands 20 mm tall." },
    after: { passed: false, message: "The stop stands only 20 mm tall; make it at least 22 mm." },
  },
  {
    id: "wide-vise",
    severity: "warning",
    before: { passed: false, message: "A 130 mm jaw is wider than this stop is drawn for (up to 120 mm)." },
    after: { passed: true, message: "A 130 mm jaw suits this stop." },
  },
];

/** A 160 mm jaw (2.0.0 allows 150 mm) on an M5 screw (dropped in 2.0.0). */
export const outOfRangeDecisions: ParameterChange[] = [
  {
    kind: "out-of-range",
    key: "jawWidth",
    label: "Jaw width",
    saved: mm(160),
    limits: { min: mm(40), max: mm(150) },
  },
  {
    kind: "not-offered",
    key: "screw",
    label: "Screw",
    saved: { value: "M5", text: "M5" },
    offered: ["M6", "M8"],
    replacement: { value: "M6", text: "M6" },
  },
];

/** Differences every design on 1.0.0 meets, whatever its values (values from the two YAML files). */
export const stopHeightDefaultMoved: ParameterChange = {
  kind: "default-changed",
  key: "stopHeight",
  label: "Stop height",
  from: mm(20),
  to: mm(24),
  affectsDesign: false,
};
export const screwDepthAdded: ParameterChange = {
  kind: "added",
  key: "screwDepth",
  label: "Screw depth",
  default: mm(10),
};
export const padThicknessDropped: ParameterChange = {
  kind: "removed",
  key: "padThickness",
  label: "Pad thickness",
  saved: mm(3),
};

/** The saved design those answers are about, as the designs list sends it. */
export const designOnOldVersion: Design = {
  id: 5,
  name: "Stop for the 160 mm vise",
  notes: "",
  templateId: "test-step-stop",
  templateVersion: "1.0.0",
  templateName: "Test step stop",
  newerVersion: "2.0.0",
  parameters: {
    jawWidth: 160,
    stopHeight: 20,
    padThickness: 3,
    screw: "M5",
    metal: "brass",
    breakEdges: true,
  },
  units: "mm",
  share: null,
  createdAt: "2026-01-01T00:00:00.000Z",
  updatedAt: "2026-01-01T00:00:00.000Z",
};
