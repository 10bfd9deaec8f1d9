import { viseSizeLabels } from "@/shared/profiles";
import type { FieldSpec } from "./draft";

/** The columns of "my vises": every size in millimetres, as stored. */
export const viseFields: readonly FieldSpec[] = [
  { key: "name", label: "Name", kind: "text" },
  { key: "jawWidthMm", label: viseSizeLabels.jawWidthMm, unit: "mm", kind: "number" },
  { key: "jawHeightMm", label: viseSizeLabels.jawHeightMm, unit: "mm", kind: "number" },
  { key: "jawThicknessMm", label: viseSizeLabels.jawThicknessMm, unit: "mm", kind: "number" },
  { key: "maxOpeningMm", label: viseSizeLabels.maxOpeningMm, unit: "mm", kind: "number" },
];

/** The columns of "my machines". */
export const machineFields: readonly FieldSpec[] = [
  { key: "name", label: "Name", kind: "text" },
  { key: "maxSpindleRpm", label: "Maximum spindle speed", unit: "rpm", kind: "number" },
  {
    key: "units",
    label: "Works in",
    kind: "choice",
    choices: [
      { value: "mm", label: "Millimetres" },
      { value: "in", label: "Inches" },
    ],
  },
];
