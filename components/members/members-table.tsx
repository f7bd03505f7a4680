"use client";
import { scrollArea } from "@/components/ui/scroll-area";
import {
  createColumnHelper, flexRender, getCoreRowModel, getFilteredRowModel, getPaginationRowModel, getSortedRowModel,
  useReactTable, type SortingState,
} from "@tanstack/react-table";
import Link from "next/link";
import { usePathname, useRouter, useSearchParams } from "next/navigation";
import { useMemo } from "react";
import { ROLE_LABELS, type Role } from "@/permissions/roles";

export type MemberTableRow = { membershipId: string; name: string | null; email: string; roles: Role[]; status: "active" | "inactive"; joinedOn: string };

const col = createColumnHelper<MemberTableRow>();
const PAGE_SIZE = 20;

export function MembersTable({ rows, slug, canManage }: { rows: MemberTableRow[]; slug: string; canManage: boolean }) {
  const router = useRouter();
  const pathname = usePathname();
  const params = useSearchParams();
  // List state lives in the URL, so a filtered, sorted page can be shared or reloaded.
  const q = params.get("q") ?? "";
  const sortParam = params.get("sort") ?? "name";
  const sorting: SortingState = [{ id: sortParam.replace(/^-/, ""), desc: sortParam.startsWith("-") }];
  const page = Math.max(0, Number(params.get("page") ?? "1") - 1);
  const status = params.get("status") ?? "active";

  function setParams(next: Record<string, string | null>) {
    const sp = new URLSearchParams(params.toString());
    for (const [k, v] of Object.entries(next)) {
      if (v === null || v === "") sp.delete(k);
      else sp.set(k, v);
    }
    router.replace(`${pathname}?${sp.toString()}`, { scroll: false });
  }

  const data = useMemo(() => rows.filter((r) => status === "all" || r.status === status), [rows, status]);
  const columns = useMemo(
    () => [
      col.accessor((r) => r.name ?? r.email, {
        id: "name",
        header: "Name",
        cell: (c) => (canManage ? <Link href={`/clubs/${slug}/members/${c.row.original.membershipId}`}>{c.getValue()}</Link> : c.getValue()),
      }),
      col.accessor("email", { header: "E-mail", cell: (c) => <span className="break-all">{c.getValue()}</span> }),
      col.accessor((r) => r.roles.map((x) => ROLE_LABELS[x]).join(", "), { id: "roles", header: "Roles" }),
      col.accessor("joinedOn", { header: "Joined", cell: (c) => <span className="tabular font-mono text-sm">{c.getValue()}</span> }),
      col.accessor("status", { header: "Status", cell: (c) => (c.getValue() === "active" ? "Active" : "Inactive") }),
    ],
    [canManage, slug],
  );

  const table = useReactTable({
    data,
    columns,
    state: { sorting, globalFilter: q, pagination: { pageIndex: page, pageSize: PAGE_SIZE } },
    onSortingChange: (updater) => {
      const next = typeof updater === "function" ? updater(sorting) : updater;
      const s = next[0];
      setParams({ sort: s ? `${s.desc ? "-" : ""}${s.id}` : null, page: null });
    },
    onGlobalFilterChange: (value) => setParams({ q: String(value ?? ""), page: null }),
    onPaginationChange: (updater) => {
      const next = typeof updater === "function" ? updater({ pageIndex: page, pageSize: PAGE_SIZE }) : updater;
      setParams({ page: next.pageIndex ? String(next.pageIndex + 1) : null });
    },
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
    getPaginationRowModel: getPaginationRowModel(),
    manualPagination: false,
    autoResetPageIndex: false,
  });

  return (
    <div>
      <div className="mb-3 flex flex-wrap items-end gap-3">
        <label className="min-w-0 flex-1">
          <span className="field-label">Search</span>
          <input className="field-input" type="search" defaultValue={q} placeholder="Name, e-mail or role" onChange={(e) => table.setGlobalFilter(e.target.value)} />
        </label>
        <label>
          <span className="field-label">Show</span>
          <select className="field-input" value={status} onChange={(e) => setParams({ status: e.target.value === "active" ? null : e.target.value, page: null })}>
            <option value="active">Active members</option>
            <option value="inactive">Inactive</option>
            <option value="all">Everyone</option>
          </select>
        </label>
      </div>
      <div className="overflow-x-auto rounded border border-sand-300 bg-white" {...scrollArea("Members")}>
        <table className="w-full min-w-[36rem] text-left text-sm">
          <thead className="bg-sand-200">
            {table.getHeaderGroups().map((hg) => (
              <tr key={hg.id}>
                {hg.headers.map((h) => {
                  const sorted = h.column.getIsSorted();
                  return (
                    <th key={h.id} scope="col" aria-sort={sorted === "asc" ? "ascending" : sorted === "desc" ? "descending" : "none"} className="px-3 py-2">
                      <button type="button" className="font-bold" onClick={h.column.getToggleSortingHandler()}>
                        {flexRender(h.column.columnDef.header, h.getContext())}
                        <span aria-hidden="true">{sorted === "asc" ? " ↑" : sorted === "desc" ? " ↓" : ""}</span>
                      </button>
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody>
            {table.getRowModel().rows.map((row) => (
              <tr key={row.id} className="border-t border-sand-200">
                {row.getVisibleCells().map((cell) => (
                  <td key={cell.id} className="px-3 py-2 align-top">{flexRender(cell.column.columnDef.cell, cell.getContext())}</td>
                ))}
              </tr>
            ))}
            {table.getRowModel().rows.length === 0 ? (
              <tr><td colSpan={columns.length} className="px-3 py-6 text-center text-ink-500">No members match.</td></tr>
            ) : null}
          </tbody>
        </table>
      </div>
      <div className="mt-3 flex flex-wrap items-center gap-3 text-sm">
        <button type="button" className="rounded border border-sand-500 px-3 py-1 disabled:opacity-40" onClick={() => table.previousPage()} disabled={!table.getCanPreviousPage()}>Previous</button>
        <span>Page {table.getState().pagination.pageIndex + 1} of {Math.max(1, table.getPageCount())} · {table.getFilteredRowModel().rows.length} members</span>
        <button type="button" className="rounded border border-sand-500 px-3 py-1 disabled:opacity-40" onClick={() => table.nextPage()} disabled={!table.getCanNextPage()}>Next</button>
      </div>
    </div>
  );
}
