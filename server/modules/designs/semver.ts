/**
 * Orders semantic versions by the precedence rules of Semantic Versioning 2.0.0, §11
 * (https://semver.org/spec/v2.0.0.html): major, minor, patch compared as numbers; a pre-release sorts
 * before its release; pre-release identifiers compare one by one, numeric ones as numbers and below
 * alphanumeric ones, and a shorter list of equal identifiers sorts first. Build metadata (`+…`) is ignored.
 * Returns a negative number, 0 or a positive number; null if either is not a semantic version.
 */
export function compareSemver(a: string, b: string): number | null {
  const x = parse(a);
  const y = parse(b);
  if (!x || !y) return null;
  for (let i = 0; i < 3; i++) {
    const d = x.core[i]! - y.core[i]!;
    if (d !== 0) return Math.sign(d);
  }
  if (x.pre.length === 0 || y.pre.length === 0) return Math.sign(y.pre.length - x.pre.length);
  const n = Math.min(x.pre.length, y.pre.length);
  for (let i = 0; i < n; i++) {
    const d = compareIdentifier(x.pre[i]!, y.pre[i]!);
    if (d !== 0) return d;
  }
  return Math.sign(x.pre.length - y.pre.length);
}

const pattern =
  /^(0|[1-9]\d*)\.(0|[1-9]\d*)\.(0|[1-9]\d*)(?:-([0-9A-Za-z-]+(?:\.[0-9A-Za-z-]+)*))?(?:\+[0-9A-Za-z.-]+)?$/;

function parse(v: string): { core: [number, number, number]; pre: string[] } | null {
  const m = pattern.exec(v.trim());
  if (!m) return null;
  return { core: [Number(m[1]), Number(m[2]), Number(m[3])], pre: m[4] ? m[4].split(".") : [] };
}

function compareIdentifier(a: string, b: string): number {
  const an = /^\d+$/.test(a);
  const bn = /^\d+$/.test(b);
  if (an && bn) return Math.sign(Number(a) - Number(b));
  if (an !== bn) return an ? -1 : 1;
  return a < b ? -1 : a > b ? 1 : 0;
}

/** True when `candidate` has higher precedence than `pinned`; false when equal, lower or unparseable. */
export function isNewerVersion(candidate: string, pinned: string): boolean {
  const c = compareSemver(candidate, pinned);
  return c !== null && c > 0;
}
