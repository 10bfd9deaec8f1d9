/**
 * Deep freezing of answers that are remembered and shared between callers (recent parts, recent
 * evaluations). Freezing costs about a third of an evaluation, so it is done only under test
 * (NODE_ENV=test, as vitest sets): there, code that changed a shared answer throws instead of silently
 * corrupting the next caller's result.
 */
const UNDER_TEST = (globalThis as { process?: { env?: Record<string, string | undefined> } }).process?.env?.NODE_ENV === "test";

/** Freezes a value and everything reachable from it. */
export function deepFreeze<T>(value: T): T {
  if (value !== null && typeof value === "object" && !Object.isFrozen(value)) {
    Object.freeze(value);
    for (const v of Object.values(value)) deepFreeze(v);
  }
  return value;
}

/** {@link deepFreeze} under test; the value as it is otherwise. */
export function freezeUnderTest<T>(value: T): T {
  return UNDER_TEST ? deepFreeze(value) : value;
}
