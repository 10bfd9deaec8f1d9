/**
 * The operation sheet: for each resolved part, the ordered steps a machinist would follow, derived from its
 * base, its cutting features and the stock chosen for it, with tool, tool diameter and spindle speed from the
 * cutting-speed calculator (capped by the machine's top speed).
 *
 * Order (common practice):
 *  - block parts: saw → square up (reference faces first) → steps → recesses → slots → V-grooves → holes by
 *    stage (all spotting, then pilot and drilling, boring, reaming, counterbores, countersinks, tapping) →
 *    edge chamfers → deburr;
 *  - turned parts: saw → face and turn all diameters in one setting → on-axis holes from the free end →
 *    external threads → chamfers on the free end → part off → reverse, face to length and work the other end
 *    → eccentric bores held in a four-jaw chuck → off-axis features on the mill → deburr.
 */
import { SETUP_CAUTION, type Source } from "../../calculators/types";
import { cuttingSpeedSources, SPEED_CAUTION, type ToolMaterial } from "../../calculators/cutting-speed";
import { getMaterial } from "../../materials";
import type { Direction, PatternableFeature, ResolvedFeature, ResolvedPart } from "../../parts/features";
import { expandPattern } from "../../parts/patterns";
import { defaultHoleData, type HoleData } from "../hole-data";
import { chooseStock, type StockChoice } from "../stock";
import { stockSizeSources } from "../stock-sizes";
import { dia, len, NO_SPEED, speed, type DraftOperation, type OpContext } from "./context";
import { eccentricBoreOperations, HOLE_STAGE_ORDER, holeOperations, tappedHoleOperations, type HoleSite } from "./holes";
import { chamferOperation, pocketOperation, slotOperation, stepOperation, vGrooveOperation } from "./milling";
import type { MachiningOperation, OperationSheet, OperationSheetOptions, PartOperations } from "./types";

/** Parting is run at about half the turning speed (common practice). */
export const PARTING_SPEED_FRACTION = 0.5;

const sheetSources: Source[] = [
  ...cuttingSpeedSources,
  ...stockSizeSources,
  { title: "Order of operations, tool choice and work-holding notes for small-shop milling and turning", kind: "common practice" },
];

const featureName = (f: ResolvedFeature, index: number): string => f.id ?? f.label ?? `${f.kind} #${index}`;

/** A hole-like feature sits on the turned axis when it runs along z through x = y = 0. */
function onTurnedAxis(f: PatternableFeature): boolean {
  if (f.kind !== "hole" && f.kind !== "thread") return false;
  return (f.direction === "+z" || f.direction === "-z") && Math.abs(f.at.x) < 1e-6 && Math.abs(f.at.y) < 1e-6;
}

/** Merges consecutive-stage duplicates: the same cut with the same tool on several features. */
function mergeAlike(ops: DraftOperation[]): DraftOperation[] {
  const out: DraftOperation[] = [];
  for (const op of ops) {
    const same = out.find((o) => o.kind === op.kind && o.machine === op.machine && o.description === op.description && o.tool === op.tool);
    if (same) {
      same.count += op.count;
      for (const f of op.features) if (!same.features.includes(f)) same.features.push(f);
    } else out.push({ ...op, features: [...op.features], notes: [...op.notes] });
  }
  return out;
}

/** Sorts hole operations by stage, keeping feature order within a stage, and merges alike. */
function byHoleStage(ops: DraftOperation[]): DraftOperation[] {
  const rank = (k: string) => {
    const i = (HOLE_STAGE_ORDER as readonly string[]).indexOf(k);
    return i < 0 ? HOLE_STAGE_ORDER.length : i;
  };
  return mergeAlike(ops.map((op, i) => ({ op, i })).sort((a, b) => rank(a.op.kind) - rank(b.op.kind) || a.i - b.i).map((x) => x.op));
}

function patternedOps(ctx: OpContext, f: PatternableFeature, site: HoleSite): DraftOperation[] {
  if (f.kind === "hole") return holeOperations(ctx, f, site);
  if (f.kind === "thread") return tappedHoleOperations(ctx, f, site);
  if (f.kind === "slot") return [slotOperation(ctx, f, site.count, site.feature)];
  return [pocketOperation(ctx, f, site.count, site.feature)];
}

function sawOp(ctx: OpContext, part: ResolvedPart, stock: StockChoice, quantity: number): DraftOperation {
  return {
    kind: "saw",
    machine: "saw",
    description: `Saw ${quantity > 1 ? `${quantity} blanks` : "a blank"} ${len(ctx, stock.cutLengthMm)} long from ${stock.designation}`,
    tool: "Band saw or hacksaw",
    toolDiameterMm: null,
    ...NO_SPEED,
    count: 1,
    features: [],
    notes: [`Allow ${len(ctx, stock.allowances.kerfMm)} of kerf per cut when working out the bar length.`, ...stock.notes],
  };
}

function deburrOp(): DraftOperation {
  return {
    kind: "deburr",
    machine: "bench",
    description: "Deburr and break all sharp edges (about 0.2 mm) unless the drawing says otherwise",
    tool: "Deburring tool, fine file",
    toolDiameterMm: null,
    ...NO_SPEED,
    count: 1,
    features: [],
    notes: [],
  };
}

function datumText(part: ResolvedPart): string {
  const d = part.datums ?? {};
  return (["x", "y", "z"] as const).map((a) => `${a} ${d[a] ?? "min"}`).join(", ");
}

/** Operations for a part with a block base. */
function blockOperations(ctx: OpContext, part: ResolvedPart, stock: StockChoice, features: ResolvedFeature[]): DraftOperation[] {
  const base = part.features[0];
  if (base?.kind !== "block") return [];
  const { x, y, z } = base.size;
  const wide = Math.min(...[x, y, z].sort((p, q) => q - p).slice(0, 2)) > 40;
  const cutter = wide ? 50 : 16;
  const ops: DraftOperation[] = [
    {
      kind: "square-up",
      machine: "mill",
      description: `Square up to ${len(ctx, x)} × ${len(ctx, y)} × ${len(ctx, z)} (x × y × z)`,
      tool: wide ? `Face mill ${dia(ctx, cutter)}` : `End mill ${dia(ctx, cutter)}`,
      toolDiameterMm: cutter,
      ...speed(ctx, "mill", cutter),
      count: 1,
      features: [featureName(base, 0)],
      notes: [
        `Machine a reference face first — the datum faces (${datumText(part)}) — then square the others to it; every later dimension is measured from these.`,
        "Hold in the vise on parallels, with a round bar between the moving jaw and the work while squaring (common practice).",
      ],
    },
  ];
  const steps: DraftOperation[] = [];
  const pockets: DraftOperation[] = [];
  const slots: DraftOperation[] = [];
  const grooves: DraftOperation[] = [];
  const holes: DraftOperation[] = [];
  const chamfers: DraftOperation[] = [];
  features.forEach((f, i) => {
    const name = featureName(f, i + 1);
    const site: HoleSite = { machine: "mill", count: 1, feature: name };
    switch (f.kind) {
      case "step":
        steps.push(stepOperation(ctx, f, name));
        break;
      case "pocket":
        pockets.push(pocketOperation(ctx, f, 1, name));
        break;
      case "slot":
        slots.push(slotOperation(ctx, f, 1, name));
        break;
      case "v-groove":
        grooves.push(vGrooveOperation(ctx, f, name));
        break;
      case "hole":
        holes.push(...holeOperations(ctx, f, site));
        break;
      case "thread":
        if (f.form === "internal") holes.push(...tappedHoleOperations(ctx, f, site));
        break;
      case "chamfer":
        chamfers.push(chamferOperation(ctx, f, name, null));
        break;
      case "pattern-linear":
      case "pattern-circular": {
        const copies = expandPattern(f);
        const first = copies[0];
        if (!first) break;
        const ops = patternedOps(ctx, first, { machine: "mill", count: copies.length, feature: name });
        const target = first.kind === "slot" ? slots : first.kind === "pocket" ? pockets : holes;
        target.push(...ops.map((o) => ({ ...o, notes: [`${copies.length}× ${f.kind === "pattern-linear" ? "in a row" : "on a circle"}: locate each from the datums.`, ...o.notes] })));
        break;
      }
      default:
        break;
    }
  });
  return [...ops, ...steps, ...mergeAlike(pockets), ...mergeAlike(slots), ...grooves, ...byHoleStage(holes), ...chamfers];
}

/** Operations for a part with a turned base. */
function turnedOperations(ctx: OpContext, part: ResolvedPart, stock: StockChoice, features: ResolvedFeature[]): DraftOperation[] {
  const base = part.features[0];
  if (base?.kind !== "turned") return [];
  const maxD = Math.max(...base.steps.map((s) => s.diameter));
  const lengthMm = base.steps.reduce((sum, s) => sum + s.length, 0);
  const steps = base.steps.map((s) => `${dia(ctx, s.diameter)} × ${len(ctx, s.length)}`).join(", ");
  const first: DraftOperation[] = [
    {
      kind: "face-and-turn",
      machine: "lathe",
      description: `Hold the ${stock.designation} in the three-jaw chuck with ${len(ctx, stock.allowances.holdMm - stock.allowances.partingToolMm)} gripped; face the end and turn ${steps} (z = 0 toward the chuck)`,
      tool: "Right-hand turning tool",
      toolDiameterMm: null,
      ...speed(ctx, "turn", stock.widthMm),
      count: 1,
      features: [featureName(base, 0)],
      notes: ["Turn every diameter in this one setting so they run true to each other; the faced end is the reference face."],
    },
  ];
  const freeEnd: DraftOperation[] = [];
  const threads: DraftOperation[] = [];
  const freeChamfers: DraftOperation[] = [];
  const otherEnd: DraftOperation[] = [];
  const eccentric: DraftOperation[] = [];
  const mill: DraftOperation[] = [];
  const crossHoles: DraftOperation[] = [];

  const axialFrom = (d: Direction) => (d === "-z" ? freeEnd : otherEnd);
  features.forEach((f, i) => {
    const name = featureName(f, i + 1);
    const lathe: HoleSite = { machine: "lathe", count: 1, feature: name };
    const milled: HoleSite = { machine: "mill", count: 1, feature: name };
    switch (f.kind) {
      case "hole":
        if (onTurnedAxis(f)) axialFrom(f.direction).push(...holeOperations(ctx, f, lathe));
        else crossHoles.push(...holeOperations(ctx, f, milled));
        break;
      case "thread":
        if (f.form === "external") {
          const stepDiameter = base.steps[f.step]?.diameter ?? maxD;
          const data = ctx.holeData.thread(f.designation);
          const byDie = data.majorDiameterMm <= 12;
          threads.push({
            kind: byDie ? "thread-die" : "single-point-thread",
            machine: "lathe",
            description: `Cut ${data.designation} external thread ${len(ctx, f.length)} long on the ${dia(ctx, stepDiameter)} step (from its ${f.from ?? "end"})`,
            tool: byDie ? `${data.designation} split die in a tailstock die holder` : `60° threading tool, ${len(ctx, data.pitchMm)} pitch`,
            toolDiameterMm: data.majorDiameterMm,
            ...NO_SPEED,
            count: 1,
            features: [name],
            notes: [
              `Chamfer the end to about the minor diameter (${dia(ctx, data.minorDiameterExternalMm)}) first so the ${byDie ? "die" : "tool"} starts cleanly.`,
              byDie
                ? "Turn the die by hand (spindle stopped, in neutral), reversing every turn to break the chip; use cutting oil."
                : "Screw-cut at the lathe's lowest speed, engaging the leadscrew at the same point each pass; check with a nut or gauge.",
            ],
          });
        } else if (onTurnedAxis(f)) axialFrom(f.direction).push(...tappedHoleOperations(ctx, f, lathe));
        else crossHoles.push(...tappedHoleOperations(ctx, f, milled));
        break;
      case "chamfer": {
        const atBottom = f.faces.includes("-z") && !f.faces.includes("+z");
        (atBottom ? otherEnd : freeChamfers).push(chamferOperation(ctx, f, name, { diameterMm: maxD }));
        break;
      }
      case "eccentric-bore":
        eccentric.push(...eccentricBoreOperations(ctx, f, name, maxD));
        break;
      case "slot":
        mill.push(slotOperation(ctx, f, 1, name));
        break;
      case "pocket":
        if (f.shape.kind === "round" && (f.direction === "+z" || f.direction === "-z") && Math.abs(f.at.x) < 1e-6 && Math.abs(f.at.y) < 1e-6) {
          // A round recess on the axis is bored on the lathe, in the setting that faces that end.
          axialFrom(f.direction).push({
            kind: "bore",
            machine: "lathe",
            description: `Bore a flat-bottomed recess ${dia(ctx, f.shape.diameter)} × ${len(ctx, f.depth)} deep in the end`,
            tool: "Boring bar (flat-bottom)",
            toolDiameterMm: f.shape.diameter,
            ...speed(ctx, "turn", f.shape.diameter),
            count: 1,
            features: [name],
            notes: [],
          });
        } else mill.push(pocketOperation(ctx, f, 1, name));
        break;
      case "step":
        mill.push(stepOperation(ctx, f, name));
        break;
      case "v-groove":
        mill.push(vGrooveOperation(ctx, f, name));
        break;
      case "pattern-linear":
      case "pattern-circular": {
        const copies = expandPattern(f);
        const firstCopy = copies[0];
        if (!firstCopy) break;
        const ops = patternedOps(ctx, firstCopy, { ...milled, count: copies.length });
        (firstCopy.kind === "hole" || firstCopy.kind === "thread" ? crossHoles : mill).push(
          ...ops.map((o) => ({ ...o, notes: [`${copies.length}× pattern: use the dividing head or rotary table, or a drilling jig.`, ...o.notes] })),
        );
        break;
      }
      default:
        break;
    }
  });

  const partOff: DraftOperation = {
    kind: "part-off",
    machine: "lathe",
    description: `Part off ${len(ctx, lengthMm + stock.allowances.lengthMm / 2)} from the faced end (leaves ${len(ctx, stock.allowances.lengthMm / 2)} to face)`,
    tool: `Parting tool ${len(ctx, stock.allowances.partingToolMm)} wide`,
    toolDiameterMm: null,
    ...speed(ctx, "turn", maxD, PARTING_SPEED_FRACTION),
    count: 1,
    features: [],
    notes: ["Part off close to the chuck jaws, at about half turning speed, with plenty of cutting fluid (common practice)."],
  };
  const faceToLength: DraftOperation = {
    kind: "face-to-length",
    machine: "lathe",
    description: `Reverse in the chuck (soft jaws or a wrap of shim to protect the finish) and face to ${len(ctx, lengthMm)} overall`,
    tool: "Right-hand facing tool",
    toolDiameterMm: null,
    ...speed(ctx, "turn", maxD),
    count: 1,
    features: [],
    notes: [],
  };
  const millNote = (ops: DraftOperation[]) =>
    ops.map((o) => ({ ...o, notes: ["Hold the turned part in a vee block or a collet block, located from its axis.", ...o.notes] }));
  return [
    ...first,
    ...byHoleStage(freeEnd),
    ...threads,
    ...freeChamfers,
    partOff,
    faceToLength,
    ...byHoleStage(otherEnd),
    // The four-jaw setting comes first; its holes then follow by stage.
    ...eccentric.filter((o) => o.kind === "hold-four-jaw"),
    ...byHoleStage(eccentric.filter((o) => o.kind !== "hold-four-jaw")),
    ...millNote(mergeAlike(mill)),
    ...millNote(byHoleStage(crossHoles)),
  ];
}

/** The operations of one part (throws CalculatorInputError for an unknown material or thread). */
export function partOperations(part: ResolvedPart, options: OperationSheetOptions = {}, holeData: HoleData = defaultHoleData): PartOperations {
  const material = getMaterial(part.material);
  const units = options.units ?? "mm";
  const ctx: OpContext = {
    material: material.key,
    tool: options.tool ?? "hss",
    units,
    holeData,
    ...(options.machineMaxRpm !== undefined ? { machineMaxRpm: options.machineMaxRpm } : {}),
  };
  const stock = chooseStock(part, units === "in" ? "imperial" : "metric");
  const quantity = part.quantity ?? 1;
  const cutting = part.features.slice(1).filter((f) => f.when !== false);
  const body = part.features[0]?.kind === "turned" ? turnedOperations(ctx, part, stock, cutting) : blockOperations(ctx, part, stock, cutting);
  const drafts = [sawOp(ctx, part, stock, quantity), ...body, deburrOp()];
  const operations: MachiningOperation[] = drafts.map((d, i) => ({ step: i + 1, ...d }));
  return { partId: part.id, name: part.name, material: material.key, quantity, stock, operations };
}

/** The whole sheet for a set of resolved parts. */
export function buildOperationSheet(parts: readonly ResolvedPart[], options: OperationSheetOptions = {}, holeData: HoleData = defaultHoleData): OperationSheet {
  const toolMaterial: ToolMaterial = options.tool ?? "hss";
  const sheetParts = parts.filter((p) => p.when !== false).map((p) => partOperations(p, options, holeData));
  const cautions = [SETUP_CAUTION, SPEED_CAUTION];
  if (sheetParts.some((p) => p.operations.some((o) => o.capped))) {
    cautions.push(`Some speeds are held to the machine's top speed of ${options.machineMaxRpm} rev/min: those tools cut slower than their starting value.`);
  }
  if (sheetParts.some((p) => p.operations.some((o) => o.kind === "hold-four-jaw"))) {
    cautions.push("Offset work in a four-jaw chuck is out of balance: run it slowly and keep clear of the jaws.");
  }
  return { toolMaterial, machineMaxRpm: options.machineMaxRpm ?? null, parts: sheetParts, cautions, sources: sheetSources };
}


