import { describe, expect, it } from "vitest";
import { compileExpression, ExpressionError, ExpressionEvaluationError, MAX_EXPRESSION_LENGTH, MAX_NESTING, roundTo, Unavailable, UnavailableValueError } from "./index";

const scope = { a: 3, b: "x", w: 12, flag: true, cam: { throwMm: 2, zone: { startDeg: 45 } } };
const known = (n: string) => Object.prototype.hasOwnProperty.call(scope, n);
const opts = { isKnownName: known, isNamespace: (n: string) => n === "cam" };
const run = (text: string, s: Record<string, unknown> = scope) => compileExpression(text, opts).evaluate(s);

function refusal(text: string): ExpressionError {
  try {
    compileExpression(text, opts);
  } catch (err) {
    expect(err).toBeInstanceOf(ExpressionError);
    return err as ExpressionError;
  }
  throw new Error(`"${text.slice(0, 40)}" was not refused`);
}

describe("allowed arithmetic and logic", () => {
  it.each([
    ["1 + 2 * 3", 7],
    ["(1 + 2) * 3", 9],
    ["2 ^ 3 ^ 2", 512], // right-associative power, as in mathematics
    ["-a + 1", -2],
    ["+a", 3],
    ["7 % 3", 1],
    ["-7 % 3", 2], // floored modulo (mathjs semantics): the sign follows the divisor
    ["a mod 2", 1],
    ["w / 4", 3],
    ["min(4, a, 9)", 3],
    ["max(4, a, 9)", 9],
    ["abs(-2.5)", 2.5],
    ["sqrt(16)", 4],
    ["hypot(3, 4)", 5], // 3-4-5 right triangle
    ["ceil(1.2) + floor(1.8)", 3],
    ["pi", Math.PI],
  ])("%s = %s", (text, value) => {
    expect(run(text)).toBeCloseTo(value as number, 12);
  });

  // Plane trigonometry, exact values of the standard angles (any trigonometry table).
  it.each([
    ["sin(30)", 0.5],
    ["sin(90)", 1],
    ["cos(60)", 0.5],
    ["cos(90)", 0],
    ["tan(45)", 1],
    ["sin(-30)", -0.5],
    ["sin(390)", 0.5],
  ])("%s is exactly %s (degrees)", (text, value) => {
    expect(run(text)).toBe(value);
  });

  it.each([
    ["asin(0.5)", 30],
    ["acos(0.5)", 60],
    ["atan(1)", 45],
    ["atan2(1, 1)", 45],
    ["atan2(1, -1)", 135],
    ["cos(45)", Math.SQRT1_2],
  ])("%s ≈ %s (degrees in, degrees out)", (text, value) => {
    expect(run(text)).toBeCloseTo(value, 12);
  });

  it("rounds half away from zero on the decimal value, with digits", () => {
    expect(run("round(2.675, 2)")).toBe(2.68); // binary 2.675 is 2.67499…; a machinist means 2.68
    expect(run("round(-2.5)")).toBe(-3);
    expect(run("round(2.5)")).toBe(3);
    expect(roundTo(1.005, 2)).toBe(1.01);
    expect(() => run("round(1.5, 0.5)")).toThrow(/whole number 0–12/);
  });

  it("compares numbers, chains comparisons and combines conditions", () => {
    expect(run("0 < a <= 3")).toBe(true);
    expect(run("0 < a < 3")).toBe(false);
    expect(run("a > 2 and not (w < 10) or false")).toBe(true);
    expect(run("flag ? w : a")).toBe(12);
    expect(run("a == 3 and a != 4")).toBe(true);
  });

  it("allows text only as literals compared or chosen", () => {
    expect(run('b == "x"')).toBe(true);
    expect(run("b != 'y'")).toBe(true);
    expect(run('a > 2 ? "big" : "small"')).toBe("big");
    expect(refusal('"a" + 1').reason).toMatch(/text can only be compared/);
    expect(refusal("sqrt('4')").reason).toMatch(/numbers, not text/);
  });

  it("reads analysis fields with a dot, and only own data", () => {
    expect(run("cam.throwMm * 2")).toBe(4);
    expect(run("cam.zone.startDeg")).toBe(45);
    expect(() => run("cam.missing")).toThrow(/no field "missing"/);
    expect(() => run("cam.zone.startDeg.x")).toThrow(/no record/);
  });
});

describe("refusals name the expression and the character", () => {
  it.each([
    ["f(x)=x", 5, /defining functions/],
    ['import("fs")', 1, /function "import" is not allowed/],
    ['createUnit("furlong")', 1, /function "createUnit" is not allowed/],
    ['evaluate("1")', 1, /function "evaluate" is not allowed/],
    ['parse("1")', 1, /function "parse" is not allowed/],
    ['simplify("x")', 1, /not allowed/],
    ["derivative(a, a)", 1, /not allowed/],
    ["a=1", 2, /assigning values/],
    ["x.constructor", 2, /"constructor" cannot be read/],
    ["cam.__proto__", 4, /cannot be read/],
    ["cam['throwMm']", 4, /bracket indexing/],
    ["a[1]", 2, /bracket indexing/],
    ["[1, 2]", 1, /matrices/],
    ["{a: 1}", 1, /objects/],
    ["1:3", 2, /ranges/],
    ["2 a", 3, /implicit multiplication/],
    ["2(3)", 2, /implicit multiplication/],
    ["a!", 2, /factorial/],
    ["a & 1", 3, /bitwise/],
    ["a xor flag", 3, /xor/],
    ["5 to inch", 3, /unit conversion/],
    ["50%", 3, /percentages/],
    ["a; w", 2, /one expression/],
    ["unknownName + 1", 1, /unknown name "unknownName"/],
    ["sin", 1, /is a function/],
    ["w.length", 2, /"w" has no fields/],
    ["1e400", 1, /not finite/],
    ["Infinity", 1, /not finite/],
    ["null", 1, /not allowed/],
    ["(1 + 2", 7, /syntax error/],
  ])("%s → refused at character %i", (text, position, reason) => {
    const err = refusal(text);
    expect(err.reason).toMatch(reason);
    expect(err.position).toBe(position);
    expect(err.message).toContain(`"${text}"`);
    expect(err.message).toContain(`character ${position}`);
  });

  it("names where the expression sits in the template", () => {
    try {
      compileExpression("a = 1", { ...opts, context: "derived.slotLength" });
    } catch (err) {
      expect((err as Error).message).toMatch(/\(derived\.slotLength\) refused at character 3/);
    }
  });

  it(`refuses a 10 kB expression before parsing it (limit ${MAX_EXPRESSION_LENGTH} characters)`, () => {
    const huge = Array.from({ length: 5000 }, () => "a").join("+") + "+1";
    expect(huge.length).toBeGreaterThan(10_000 - 10);
    const err = refusal(huge);
    expect(err.position).toBe(MAX_EXPRESSION_LENGTH + 1);
    expect(err.reason).toMatch(/characters long/);
    expect(err.message.length).toBeLessThan(300); // the message shows the start, not 10 kB
  });

  it(`refuses brackets nested deeper than ${MAX_NESTING}`, () => {
    const deep = `${"(".repeat(MAX_NESTING + 1)}1${")".repeat(MAX_NESTING + 1)}`;
    const err = refusal(deep);
    expect(err.position).toBe(MAX_NESTING + 1);
    expect(err.reason).toMatch(/nested more than 32/);
    expect(() => compileExpression(`${"(".repeat(MAX_NESTING)}1${")".repeat(MAX_NESTING)}`)).not.toThrow();
  });
});

describe("evaluation is bounded to finite numbers and a plain scope", () => {
  it("refuses non-finite results with the reason", () => {
    expect(() => run("w / (a - 3)")).toThrow(ExpressionEvaluationError);
    expect(() => run("w / (a - 3)")).toThrow(/'\/' gives Infinity/);
    expect(() => run("sqrt(a - 4)")).toThrow(/sqrt of a negative number/);
    expect(() => run("asin(2)")).toThrow(/between -1 and 1/);
    expect(() => run("10 ^ 400")).toThrow(/not a finite number/);
  });

  it("type-checks at run time", () => {
    expect(() => run("b + 1", { ...scope, b: "x" })).toThrow(/needs a number, got the text "x"/);
    expect(() => run("flag ? 1 : 2", { ...scope, flag: 1 })).toThrow(/needs true or false/);
    expect(() => run("a == b")).toThrow(/compares two numbers, two texts/);
  });

  it("never sees prototype properties of the scope", () => {
    const free = compileExpression("toString");
    expect(() => free.evaluate({})).toThrow(/unknown name "toString"/);
    expect(() => compileExpression("cam.hasOwnProperty", { isNamespace: () => true })).toThrow(ExpressionError);
    // A field that is not in the record's own data is missing, even if an object prototype has it.
    expect(() => compileExpression("cam.isSealed", { isNamespace: () => true }).evaluate({ cam: {} })).toThrow(/no field "isSealed"/);
  });

  it("carries the reason of a failed earlier value", () => {
    const e = compileExpression("a + 1");
    try {
      e.evaluate({ a: new Unavailable("derived value a failed: sqrt of a negative number") });
      throw new Error("no error");
    } catch (err) {
      expect(err).toBeInstanceOf(UnavailableValueError);
      expect((err as Error).message).toMatch(/"a" has no value \(derived value a failed/);
    }
  });

  it("lists the names it reads", () => {
    expect([...compileExpression("a + w * cam.throwMm", opts).names].sort()).toEqual(["a", "cam", "w"]);
  });

  it("converts template lengths for calculators with toMm / fromMm", () => {
    const inch = { mmPerTemplateUnit: 25.4 };
    expect(compileExpression("toMm(2)", { factors: inch }).evaluate({})).toBeCloseTo(50.8, 12);
    expect(compileExpression("fromMm(25.4)", { factors: inch }).evaluate({})).toBeCloseTo(1, 12);
    expect(compileExpression("toMm(2)").evaluate({})).toBe(2);
  });
});
