import {
  createColumnHelper,
  flexRender,
  getCoreRowModel,
  getFilteredRowModel,
  getSortedRowModel,
  useReactTable,
  type SortingState,
} from "@tanstack/react-table";
import { useMemo, useState } from "react";
import type { PublicUser, Role } from "@/shared/auth";
import { RoleSelect } from "./role-select";

const column = createColumnHelper<PublicUser>();
const dateFormat = new Intl.DateTimeFormat(undefined, { year: "numeric", month: "short", day: "numeric" });

/**
 * Every account, sortable by any column and filtered by the search box; the role column edits in place.
 * `pendingUserId` greys out the row whose change is on its way.
 */
export function UsersTable({
  users,
  currentUserId,
  pendingUserId,
  onRoleChange,
}: {
  users: PublicUser[];
  currentUserId: number | undefined;
  pendingUserId: number | null;
  onRoleChange: (user: PublicUser, role: Role) => void;
}) {
  const [sorting, setSorting] = useState<SortingState>([{ id: "id", desc: false }]);
  const [filter, setFilter] = useState("");
  const columns = useMemo(
    () => [
      column.accessor("id", {
        header: "No.",
        cell: (c) => <span className="figure text-steel-600">{c.getValue()}</span>,
      }),
      column.accessor("displayName", {
        header: "Name",
        cell: (c) => (
          <span className="font-semibold">
            {c.getValue()}
            {c.row.original.id === currentUserId ? (
              <span className="ml-2 text-sm font-normal text-steel-600">(you)</span>
            ) : null}
          </span>
        ),
      }),
      column.accessor("email", {
        header: "E-mail",
        cell: (c) => <span className="break-all">{c.getValue()}</span>,
      }),
      column.accessor("role", {
        header: "Role",
        cell: (c) => (
          <RoleSelect
            userName={c.row.original.displayName}
            userEmail={c.row.original.email}
            value={c.getValue()}
            disabled={pendingUserId === c.row.original.id}
            onChange={(role) => onRoleChange(c.row.original, role)}
          />
        ),
      }),
      column.accessor("createdAt", {
        header: "Joined",
        cell: (c) => <span className="figure text-sm">{dateFormat.format(new Date(c.getValue()))}</span>,
      }),
    ],
    [currentUserId, pendingUserId, onRoleChange],
  );
  const table = useReactTable({
    data: users,
    columns,
    state: { sorting, globalFilter: filter },
    onSortingChange: setSorting,
    onGlobalFilterChange: setFilter,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
  });
  const rows = table.getRowModel().rows;

  return (
    <div className="space-y-3">
      <label className="flex max-w-sm flex-col gap-1">
        <span className="font-semibold">Find an account</span>
        <input
          type="search"
          value={filter}
          onChange={(e) => setFilter(e.target.value)}
          placeholder="Name, e-mail or role"
          className="min-h-11 rounded-md border border-steel-300 bg-white px-3"
        />
      </label>
      <div className="overflow-x-auto rounded-lg border border-steel-200 bg-white shadow-sm">
        <table className="w-full text-left">
          <caption className="sr-only">Accounts, sorted by {sorting[0]?.id ?? "number"}</caption>
          <thead className="bg-steel-100 text-sm uppercase tracking-wide text-steel-700">
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                {group.headers.map((header) => {
                  const sorted = header.column.getIsSorted();
                  return (
                    <th
                      key={header.id}
                      scope="col"
                      className="px-3 py-2"
                      aria-sort={sorted === "asc" ? "ascending" : sorted === "desc" ? "descending" : "none"}
                    >
                      <button
                        type="button"
                        onClick={header.column.getToggleSortingHandler()}
                        className="inline-flex min-h-11 items-center gap-1 font-semibold uppercase hover:text-steel-950"
                      >
                        {flexRender(header.column.columnDef.header, header.getContext())}
                        <span aria-hidden="true" className="text-spark-700">
                          {sorted === "asc" ? "▲" : sorted === "desc" ? "▼" : ""}
                        </span>
                      </button>
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody>
            {rows.map((row) => (
              <tr
                key={row.id}
                data-user-email={row.original.email}
                className="border-t border-steel-200 hover:bg-steel-50"
              >
                {row.getVisibleCells().map((cell) => (
                  <td key={cell.id} className="px-3 py-2 align-middle">
                    {flexRender(cell.column.columnDef.cell, cell.getContext())}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
        {rows.length === 0 ? (
          <p className="px-3 py-6 text-center text-steel-600">No account matches “{filter}”.</p>
        ) : null}
      </div>
    </div>
  );
}
