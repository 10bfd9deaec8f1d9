import { useId, useState, type KeyboardEvent } from "react";
import { z } from "zod";
import { Button } from "@/components/ui/button";
import { cn } from "@/components/ui/cn";
import { isApiError } from "@/lib/api-error";
import { designNotesSchema } from "@/shared/designs";
import { profileNameSchema } from "@/shared/profiles";

/** The same rules the server applies to a rename (src/shared): name 1–80 characters, notes ≤ 2000. */
const detailsSchema = z.object({ name: profileNameSchema, notes: designNotesSchema });
export type DesignDetails = z.infer<typeof detailsSchema>;

/** Inline form to rename a design and change its notes. Escape cancels; Enter in the name saves. */
export function DetailsForm({
  initial,
  onSave,
  onCancel,
}: {
  initial: DesignDetails;
  onSave: (details: DesignDetails) => Promise<unknown>;
  onCancel: () => void;
}) {
  const id = useId();
  const [name, setName] = useState(initial.name);
  const [notes, setNotes] = useState(initial.notes);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [saving, setSaving] = useState(false);

  async function save() {
    const r = detailsSchema.safeParse({ name, notes });
    if (!r.success) {
      const out: Record<string, string> = {};
      for (const i of r.error.issues) out[String(i.path[0] ?? "")] ??= i.message;
      setErrors(out);
      return;
    }
    setSaving(true);
    setErrors({});
    try {
      await onSave(r.data);
    } catch (error) {
      const out: Record<string, string> = {};
      if (isApiError(error))
        for (const d of error.details)
          out[d.path === "name" || d.path === "notes" ? d.path : ""] ??= d.message;
      if (Object.keys(out).length === 0)
        out[""] = isApiError(error) ? error.message : "Something went wrong. Try again.";
      setErrors(out);
      setSaving(false);
    }
  }
  const onKeyDown = (e: KeyboardEvent) => {
    if (e.key === "Escape") onCancel();
  };
  const field = (key: "name" | "notes") =>
    cn(
      "w-full rounded-md border bg-white px-3 py-2 text-base text-steel-950",
      errors[key] ? "border-fault-700" : "border-steel-300 hover:border-steel-400",
    );
  return (
    <div className="space-y-3" onKeyDown={onKeyDown}>
      <div className="space-y-1">
        <label htmlFor={`${id}-name`} className="font-semibold">
          Design name
        </label>
        <input
          id={`${id}-name`}
          value={name}
          autoFocus
          disabled={saving}
          aria-invalid={errors.name ? true : undefined}
          aria-describedby={errors.name ? `${id}-name-error` : undefined}
          onChange={(e) => setName(e.target.value)}
          onKeyDown={(e) => {
            if (e.key === "Enter") {
              e.preventDefault();
              void save();
            }
          }}
          className={cn(field("name"), "min-h-11")}
        />
        {errors.name ? (
          <p id={`${id}-name-error`} className="text-sm font-medium text-fault-700">
            ▲ {errors.name}
          </p>
        ) : null}
      </div>
      <div className="space-y-1">
        <label htmlFor={`${id}-notes`} className="font-semibold">
          Notes <span className="font-normal text-steel-600">(shown on the share page too)</span>
        </label>
        <textarea
          id={`${id}-notes`}
          value={notes}
          rows={3}
          disabled={saving}
          aria-invalid={errors.notes ? true : undefined}
          aria-describedby={errors.notes ? `${id}-notes-error` : undefined}
          onChange={(e) => setNotes(e.target.value)}
          className={field("notes")}
        />
        {errors.notes ? (
          <p id={`${id}-notes-error`} className="text-sm font-medium text-fault-700">
            ▲ {errors.notes}
          </p>
        ) : null}
      </div>
      {errors[""] ? (
        <p role="alert" className="text-sm font-medium text-fault-700">
          {errors[""]}
        </p>
      ) : null}
      <div className="flex gap-2">
        <Button onClick={save} disabled={saving}>
          {saving ? "Saving…" : "Save"}
        </Button>
        <Button variant="quiet" onClick={onCancel} disabled={saving}>
          Cancel
        </Button>
      </div>
    </div>
  );
}
