/**
 * The upgrade report (src/shared/design-upgrade.ts) in plain shop language. Every value already carries
 * its text in the person's units ("160 mm", "6.3 in"), so these only put the words around them.
 */
import type { CheckChange, DesignUpgrade, ParameterChange } from "@/shared/design-upgrade";

/** Whether a difference needs the person to decide something before the design is used on the new version. */
export function needsAttention(change: ParameterChange): boolean {
  return change.kind === "out-of-range" || change.kind === "not-offered" || change.kind === "wrong-type";
}

const list = (items: readonly string[]) =>
  items.length <= 1 ? (items[0] ?? "") : `${items.slice(0, -1).join(", ")} and ${items.at(-1)!}`;

/** One sentence (or two) for one parameter difference, as seen from the pinned version `from` to `to`. */
export function parameterSentence(change: ParameterChange, from: DesignUpgrade["from"], to: string): string {
  switch (change.kind) {
    case "added":
      return from.available
        ? `New in version ${to}: ${change.label}. It starts at its default, ${change.default.text}.`
        : `${change.label} is not among your saved values: it starts at version ${to}'s default, ${change.default.text}.`;
    case "removed":
      return `Dropped: version ${to} no longer asks for ${change.label}, so your ${change.saved.text} is left out.`;
    case "out-of-range":
      return `Your ${change.label.toLowerCase()} of ${change.saved.text} is outside version ${to}'s limits (${change.limits.min.text} to ${change.limits.max.text}). It is carried over unchanged and marked in the configurator: change it there, or keep the design on version ${from.version}.`;
    case "not-offered":
      return `${change.label}: ${change.saved.text} is no longer offered (version ${to} offers ${list(change.offered)}). The configurator starts on ${change.replacement.text}; pick the one you want.`;
    case "wrong-type":
      return `${change.label} now takes a different kind of value, so your ${change.saved.text} cannot be carried over; it starts at ${change.replacement.text}.`;
    case "default-changed":
      return change.affectsDesign
        ? `${change.label}: the default moved from ${change.from.text} to ${change.to.text}. Your design used the default, so it becomes ${change.to.text}.`
        : `${change.label}: the default moved from ${change.from.text} to ${change.to.text}; your design keeps its own value.`;
    case "limits-changed":
      return `${change.label}: the limits are now ${change.to.min.text} to ${change.to.max.text} (were ${change.from.min.text} to ${change.from.max.text}); your value is inside them.`;
    case "choices-changed": {
      const parts: string[] = [];
      if (change.added.length > 0) parts.push(`now also offers ${list(change.added)}`);
      if (change.removed.length > 0) parts.push(`no longer offers ${list(change.removed)}`);
      return `${change.label}: ${parts.join("; ")}. Your choice is still offered.`;
    }
  }
}

export type CheckShift = "now-fails" | "now-passes" | "fails-on-new" | "no-longer-checked";

/** How a check's outcome moved. `compared`: both versions were evaluated (else only the new one was). */
export function checkShift(change: CheckChange, compared: boolean): CheckShift {
  if (!change.after) return "no-longer-checked";
  if (change.after.passed) return "now-passes";
  return compared && change.before ? "now-fails" : "fails-on-new";
}

const severityWord = { error: "Error", warning: "Warning", note: "Note" } as const;

/** The heading of one check's line: "Error, now fails", "Warning, now passes", "Note, new check, fails". */
export function checkHeading(change: CheckChange, compared: boolean, to: string): string {
  const shift = checkShift(change, compared);
  const word = severityWord[change.severity];
  switch (shift) {
    case "now-fails":
      return `${word}: passed on your version, fails on ${to}`;
    case "now-passes":
      return `${word}: failed on your version, passes on ${to}`;
    case "fails-on-new":
      return compared ? `${word}: a new check on ${to}, and it fails` : `${word}: fails on ${to}`;
    case "no-longer-checked":
      return `${word}: failed on your version; ${to} no longer makes this check`;
  }
}
