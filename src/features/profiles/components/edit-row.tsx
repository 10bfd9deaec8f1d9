import { useId, type KeyboardEvent } from "react";
import { Button } from "@/components/ui/button";
import { cn } from "@/components/ui/cn";
import type { Draft, DraftErrors, FieldSpec } from "../model/draft";

/**
 * One row of a profile table in edit mode: an input per field with its unit and its message, Save and
 * Cancel. Enter saves, Escape cancels. Problems with the row as a whole show on a line below it.
 */
export function EditRow({
  fields,
  noun,
  isNew,
  draft,
  errors,
  saving,
  onChange,
  onSave,
  onCancel,
}: {
  fields: readonly FieldSpec[];
  noun: string;
  isNew: boolean;
  draft: Draft;
  errors: DraftErrors;
  saving: boolean;
  onChange: (key: string, text: string) => void;
  onSave: () => void;
  onCancel: () => void;
}) {
  const id = useId();
  const onKeyDown = (e: KeyboardEvent<HTMLElement>) => {
    if (e.key === "Enter") {
      e.preventDefault();
      onSave();
    } else if (e.key === "Escape") {
      e.preventDefault();
      onCancel();
    }
  };
  const what = isNew ? `new ${noun}` : (draft.name ?? noun);
  return (
    <>
      <tr className="border-t border-steel-200 bg-spark-50/60" data-editing={isNew ? "new" : "row"}>
        {fields.map((f, i) => {
          const error = errors[f.key];
          const inputId = `${id}-${f.key}`;
          const errorId = error ? `${inputId}-error` : undefined;
          const label = `${f.label}${f.unit ? ` (${f.unit})` : ""} of ${what}`;
          const common = {
            id: inputId,
            "aria-label": label,
            "aria-invalid": error ? true : undefined,
            "aria-describedby": errorId,
            disabled: saving,
            onKeyDown,
            autoFocus: i === 0,
            className: cn(
              "min-h-11 w-full rounded-md border bg-white px-2 py-1 text-base text-steel-950",
              f.kind === "text" ? "min-w-48" : "min-w-20",
              error ? "border-fault-700" : "border-steel-300 hover:border-steel-400",
            ),
          };
          return (
            <td key={f.key} className="px-3 py-2 align-top">
              <div className="flex items-center gap-1">
                {f.kind === "choice" ? (
                  <select
                    {...common}
                    value={draft[f.key] ?? ""}
                    onChange={(e) => onChange(f.key, e.target.value)}
                  >
                    {f.choices?.map((o) => (
                      <option key={o.value} value={o.value}>
                        {o.label}
                      </option>
                    ))}
                  </select>
                ) : (
                  <input
                    {...common}
                    type="text"
                    inputMode={f.kind === "number" ? "decimal" : undefined}
                    autoComplete="off"
                    value={draft[f.key] ?? ""}
                    onChange={(e) => onChange(f.key, e.target.value)}
                    className={cn(common.className, f.kind === "number" && "figure text-right")}
                  />
                )}
                {f.unit ? (
                  <span aria-hidden="true" className="figure text-sm text-steel-600">
                    {f.unit}
                  </span>
                ) : null}
              </div>
              {error ? (
                <p id={errorId} className="mt-1 flex items-start gap-1 text-sm font-medium text-fault-700">
                  <span aria-hidden="true">▲</span>
                  {error}
                </p>
              ) : null}
            </td>
          );
        })}
        <td className="px-3 py-2 align-top">
          <div className="flex gap-1">
            <Button onClick={onSave} disabled={saving}>
              {saving ? "Saving…" : isNew ? "Add" : "Save"}
            </Button>
            <Button variant="quiet" onClick={onCancel} disabled={saving}>
              Cancel
            </Button>
          </div>
        </td>
      </tr>
      {errors[""] ? (
        <tr className="bg-spark-50/60">
          <td colSpan={fields.length + 1} className="px-3 pb-3">
            <p role="alert" className="text-sm font-medium text-fault-700">
              {errors[""]}
            </p>
          </td>
        </tr>
      ) : null}
    </>
  );
}
