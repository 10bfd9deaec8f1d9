import {
  createColumnHelper,
  flexRender,
  getCoreRowModel,
  getSortedRowModel,
  useReactTable,
  type SortingState,
} from "@tanstack/react-table";
import { useMemo, useState, type ReactNode } from "react";
import type { ZodType } from "zod";
import { Button } from "@/components/ui/button";
import { cn } from "@/components/ui/cn";
import { Notice } from "@/components/ui/notice";
import { isApiError } from "@/lib/api-error";
import {
  changedFields,
  checkDraft,
  draftOf,
  emptyDraft,
  type Draft,
  type DraftErrors,
  type FieldSpec,
} from "../model/draft";
import { EditRow } from "./edit-row";

export interface ProfileRow {
  id: number;
  name: string;
  [key: string]: unknown;
}

export interface ProfileTableProps<R extends ProfileRow, F extends Record<string, unknown>> {
  /** Accessible name of the table, e.g. "Your vises". */
  caption: string;
  /** Singular noun for buttons and messages ("vise"). */
  noun: string;
  rows: R[];
  fields: readonly FieldSpec[];
  /** The shared schema of the editable fields (what the server checks). */
  schema: ZodType<F>;
  onCreate: (values: F) => Promise<unknown>;
  onUpdate: (id: number, changes: Partial<F>) => Promise<unknown>;
  onDelete: (id: number) => Promise<unknown>;
  /** Shown instead of the rows when there are none. */
  empty: ReactNode;
}

type Editing = { id: number | "new"; draft: Draft; errors: DraftErrors; saving: boolean };
type Outcome = { tone: "holds" | "fault"; text: string } | null;

const numberFormat = new Intl.NumberFormat(undefined, { maximumFractionDigits: 3 });
const column = createColumnHelper<ProfileRow>();

/** Turns a refused save into messages on the fields the server named; the rest go to the row. */
function serverErrors(error: unknown, fields: readonly FieldSpec[], noun: string): DraftErrors {
  if (!isApiError(error)) return { "": "Something went wrong. Try again." };
  if (error.status === 404)
    return { "": `This ${noun} no longer exists; it may have been deleted in another tab.` };
  const out: DraftErrors = {};
  for (const d of error.details) {
    const key = fields.some((f) => f.key === d.path) ? d.path : "";
    if (!(key in out)) out[key] = d.message;
  }
  if (Object.keys(out).length === 0) out[""] = error.message;
  return out;
}

/**
 * A sortable table of one kind of profile with inline editing: Edit turns the row into inputs checked by
 * the shared schema (one message under each bad field, nothing sent until all are good); Add opens an
 * empty row at the top; Delete asks to confirm in the row. Enter saves and Escape cancels in any input.
 */
export function ProfileTable<R extends ProfileRow, F extends Record<string, unknown>>({
  caption,
  noun,
  rows,
  fields,
  schema,
  onCreate,
  onUpdate,
  onDelete,
  empty,
}: ProfileTableProps<R, F>) {
  const [sorting, setSorting] = useState<SortingState>([{ id: "name", desc: false }]);
  const [editing, setEditing] = useState<Editing | null>(null);
  const [confirmingId, setConfirmingId] = useState<number | null>(null);
  const [deletingId, setDeletingId] = useState<number | null>(null);
  const [outcome, setOutcome] = useState<Outcome>(null);

  const columns = useMemo(
    () =>
      fields.map((f) =>
        column.accessor((r) => r[f.key] as string | number, {
          id: f.key,
          header: f.unit ? `${f.label} (${f.unit})` : f.label,
          sortingFn: f.kind === "number" ? "basic" : "alphanumeric",
          // Smallest first on the first press, for numbers too (the table library's default is largest first).
          sortDescFirst: false,
          cell: (c) => {
            const v = c.getValue();
            if (f.kind === "number" && typeof v === "number")
              return <span className="figure">{numberFormat.format(v)}</span>;
            if (f.kind === "choice") return f.choices?.find((o) => o.value === v)?.label ?? String(v);
            return <span className={f.key === "name" ? "font-semibold" : undefined}>{String(v)}</span>;
          },
        }),
      ),
    [fields],
  );
  const table = useReactTable({
    data: rows as ProfileRow[],
    columns,
    state: { sorting },
    onSortingChange: setSorting,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
  });

  const startEdit = (row: R) => {
    setConfirmingId(null);
    setOutcome(null);
    setEditing({ id: row.id, draft: draftOf(row, fields), errors: {}, saving: false });
  };
  const startAdd = () => {
    setConfirmingId(null);
    setOutcome(null);
    setEditing({ id: "new", draft: emptyDraft(fields), errors: {}, saving: false });
  };
  const cancel = () => setEditing(null);

  async function save() {
    if (!editing || editing.saving) return;
    const checked = checkDraft(schema, editing.draft, fields);
    if (!checked.ok) {
      setEditing({ ...editing, errors: checked.errors });
      return;
    }
    const target = editing.id;
    const original = target === "new" ? undefined : rows.find((r) => r.id === target);
    const changes = original ? changedFields(original, checked.value) : checked.value;
    if (original && Object.keys(changes).length === 0) {
      setEditing(null);
      return;
    }
    setEditing({ ...editing, errors: {}, saving: true });
    try {
      if (target === "new") await onCreate(checked.value);
      else await onUpdate(target, changes);
      setEditing(null);
      setOutcome({
        tone: "holds",
        text: `${target === "new" ? "Added" : "Saved"} “${checked.value.name as string}”.`,
      });
    } catch (error) {
      setEditing((e) => (e ? { ...e, saving: false, errors: serverErrors(error, fields, noun) } : e));
    }
  }

  async function confirmDelete(row: R) {
    setDeletingId(row.id);
    try {
      await onDelete(row.id);
      setOutcome({ tone: "holds", text: `Deleted “${row.name}”.` });
    } catch (error) {
      setOutcome({
        tone: "fault",
        text: `“${row.name}” was not deleted: ${isApiError(error) ? error.message : "try again."}`,
      });
    } finally {
      setDeletingId(null);
      setConfirmingId(null);
    }
  }

  const editRow = (id: number | "new") =>
    editing && editing.id === id ? (
      <EditRow
        key={`edit-${id}`}
        fields={fields}
        noun={noun}
        isNew={id === "new"}
        draft={editing.draft}
        errors={editing.errors}
        saving={editing.saving}
        onChange={(key, text) => setEditing((e) => (e ? { ...e, draft: { ...e.draft, [key]: text } } : e))}
        onSave={save}
        onCancel={cancel}
      />
    ) : null;

  const sortedRows = table.getRowModel().rows;
  const isNumber = (key: string) => fields.some((f) => f.key === key && f.kind === "number");
  return (
    <div className="space-y-3">
      <div className="flex flex-wrap items-center gap-3">
        <Button variant="secondary" onClick={startAdd} disabled={editing?.id === "new"}>
          <svg viewBox="0 0 16 16" className="size-4" aria-hidden="true">
            <path d="M8 2v12M2 8h12" stroke="currentColor" strokeWidth="2" strokeLinecap="round" />
          </svg>
          Add a {noun}
        </Button>
        <div aria-live="polite" className="min-w-0 flex-1">
          {outcome ? <Notice tone={outcome.tone}>{outcome.text}</Notice> : null}
        </div>
      </div>
      {rows.length === 0 && editing?.id !== "new" ? (
        <div className="rounded-lg border border-dashed border-steel-300 bg-white px-4 py-6 text-steel-700">
          {empty}
        </div>
      ) : (
        <div className="overflow-x-auto rounded-lg border border-steel-200 bg-white shadow-sm">
          <table className="w-full text-left">
            <caption className="sr-only">{caption}</caption>
            <thead className="bg-steel-100 text-sm uppercase tracking-wide text-steel-700">
              {table.getHeaderGroups().map((group) => (
                <tr key={group.id}>
                  {group.headers.map((header) => {
                    const sorted = header.column.getIsSorted();
                    return (
                      <th
                        key={header.id}
                        scope="col"
                        className={cn("px-3 py-2", isNumber(header.column.id) && "text-right")}
                        aria-sort={sorted === "asc" ? "ascending" : sorted === "desc" ? "descending" : "none"}
                      >
                        <button
                          type="button"
                          onClick={header.column.getToggleSortingHandler()}
                          className="inline-flex min-h-11 items-center gap-1 text-left font-semibold uppercase hover:text-steel-950"
                        >
                          {flexRender(header.column.columnDef.header, header.getContext())}
                          <span aria-hidden="true" className="text-spark-700">
                            {sorted === "asc" ? "▲" : sorted === "desc" ? "▼" : ""}
                          </span>
                        </button>
                      </th>
                    );
                  })}
                  <th scope="col" className="px-3 py-2">
                    <span className="sr-only">Actions</span>
                  </th>
                </tr>
              ))}
            </thead>
            <tbody>
              {editRow("new")}
              {sortedRows.map((row) => {
                const r = row.original as R;
                const inEdit = editRow(r.id);
                if (inEdit) return inEdit;
                const confirming = confirmingId === r.id;
                return (
                  <tr
                    key={row.id}
                    data-profile-id={r.id}
                    className="border-t border-steel-200 hover:bg-steel-50"
                  >
                    {row.getVisibleCells().map((cell) => (
                      <td
                        key={cell.id}
                        className={cn("px-3 py-2 align-middle", isNumber(cell.column.id) && "text-right")}
                      >
                        {flexRender(cell.column.columnDef.cell, cell.getContext())}
                      </td>
                    ))}
                    <td className="px-3 py-2 align-middle">
                      {confirming ? (
                        <div
                          className="flex flex-wrap items-center gap-2"
                          role="group"
                          aria-label={`Confirm deleting ${r.name}`}
                        >
                          <span className="text-sm font-semibold text-fault-700">Delete “{r.name}”?</span>
                          <Button
                            variant="danger"
                            onClick={() => confirmDelete(r)}
                            disabled={deletingId === r.id}
                          >
                            {deletingId === r.id ? "Deleting…" : "Delete"}
                          </Button>
                          <Button variant="quiet" onClick={() => setConfirmingId(null)} autoFocus>
                            Keep
                          </Button>
                        </div>
                      ) : (
                        <div className="flex gap-1">
                          <Button variant="quiet" onClick={() => startEdit(r)} aria-label={`Edit ${r.name}`}>
                            Edit
                          </Button>
                          <Button
                            variant="quiet"
                            onClick={() => {
                              setOutcome(null);
                              setConfirmingId(r.id);
                            }}
                            aria-label={`Delete ${r.name}`}
                          >
                            Delete
                          </Button>
                        </div>
                      )}
                    </td>
                  </tr>
                );
              })}
            </tbody>
          </table>
        </div>
      )}
    </div>
  );
}
