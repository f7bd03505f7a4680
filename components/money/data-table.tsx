"use client";
import { scrollArea } from "@/components/ui/scroll-area";
import {
  flexRender, getCoreRowModel, getFilteredRowModel, getPaginationRowModel, getSortedRowModel, useReactTable,
  type ColumnDef, type SortingState,
} from "@tanstack/react-table";
import Link from "next/link";
import { usePathname, useRouter, useSearchParams } from "next/navigation";
import { useMemo } from "react";
import { currencyExponent, DEFAULT_LOCALE, formatMoney, minorToDecimalString } from "@/lib/money";
import { formatDate, isIsoDate } from "@/lib/dates";
import { writeCsv, type CsvCell } from "@/lib/csv";
import { ActionButton, type ServerAction } from "./action-form";
import { ArrearsFlag } from "./money-text";

export type Cell = string | number | boolean | null;
export type Row = Record<string, Cell>;

export type ColumnSpec = {
  key: string;
  header: string;
  kind?: "text" | "money" | "date" | "flag" | "link";
  /** For "link": the row field holding the href. */
  hrefKey?: string;
};

export type RowAction = { action: ServerAction; slug: string; label: string; idKey: string; fieldName: string; showKey?: string; confirm?: string };

function csvValue(col: ColumnSpec, v: Cell, exponent: number): CsvCell {
  if (v === null || v === undefined) return "";
  if (col.kind === "money" && typeof v === "number") return { decimal: minorToDecimalString(v, exponent) };
  if (col.kind === "date" && typeof v === "string" && /^\d{4}-\d{2}-\d{2}$/.test(v)) return { day: v };
  if (col.kind === "flag") return v ? "yes" : "no";
  return String(v);
}

/**
 * A sortable, filterable table of server data with CSV export of what is shown (all pages).
 * Search, sort, filter and page live in the URL, prefixed so that two tables can share a page.
 */
export function DataTable({ rows, columns, currency, locale, csvName, label, filter, prefix = "", pageSize = 25, emptyText = "Nothing to show.", rowAction }: {
  rows: Row[];
  columns: ColumnSpec[];
  currency: string; locale?: string;
  csvName: string;
  label: string;
  filter?: { key: string; label: string; options: { value: string; label: string }[] };
  prefix?: string;
  pageSize?: number;
  emptyText?: string;
  rowAction?: RowAction;
}) {
  const router = useRouter();
  const pathname = usePathname();
  const params = useSearchParams();
  const p = (k: string) => `${prefix}${k}`;
  const q = params.get(p("q")) ?? "";
  const sortParam = params.get(p("sort")) ?? "";
  const sorting: SortingState = sortParam ? [{ id: sortParam.replace(/^-/, ""), desc: sortParam.startsWith("-") }] : [];
  const page = Math.max(0, Number(params.get(p("page")) ?? "1") - 1);
  const chosen = filter ? (params.get(p(filter.key)) ?? "") : "";

  function setParams(next: Record<string, string | null>) {
    const sp = new URLSearchParams(params.toString());
    for (const [k, v] of Object.entries(next)) {
      if (v === null || v === "") sp.delete(p(k));
      else sp.set(p(k), v);
    }
    router.replace(`${pathname}?${sp.toString()}`, { scroll: false });
  }

  const data = useMemo(() => (filter && chosen ? rows.filter((r) => String(r[filter.key]) === chosen) : rows), [rows, filter, chosen]);
  const defs = useMemo<ColumnDef<Row>[]>(() => {
    const base: ColumnDef<Row>[] = columns.map((c) => ({
      id: c.key,
      accessorFn: (r: Row) => r[c.key],
      header: c.header,
      sortingFn: c.kind === "money" ? "basic" : "alphanumeric",
      cell: (ctx) => {
        const v = ctx.getValue() as Cell;
        if (c.kind === "money") return typeof v === "number" ? <span className="tabular font-mono whitespace-nowrap">{formatMoney(v, currency, locale)}</span> : "";
        if (c.kind === "flag") return <ArrearsFlag inArrears={!!v} />;
        if (c.kind === "date") return typeof v === "string" && isIsoDate(v) ? <time className="tabular whitespace-nowrap" dateTime={v}>{formatDate(v, locale ?? DEFAULT_LOCALE)}</time> : <span className="tabular whitespace-nowrap">{v ?? "—"}</span>;
        const href = c.hrefKey ? ctx.row.original[c.hrefKey] : null;
        if (c.kind === "link" && typeof href === "string") return <Link href={href}>{String(v ?? "")}</Link>;
        return v === null || v === undefined ? "—" : String(v);
      },
    }));
    if (rowAction) {
      base.push({
        id: "__action",
        header: "",
        enableSorting: false,
        enableGlobalFilter: false,
        cell: (ctx) => {
          const r = ctx.row.original;
          if (rowAction.showKey && !r[rowAction.showKey]) return null;
          return <ActionButton action={rowAction.action} slug={rowAction.slug} hidden={{ [rowAction.fieldName]: String(r[rowAction.idKey]) }} label={rowAction.label} confirm={rowAction.confirm} />;
        },
      });
    }
    return base;
  }, [columns, currency, locale, rowAction]);

  const table = useReactTable({
    data,
    columns: defs,
    state: { sorting, globalFilter: q, pagination: { pageIndex: page, pageSize } },
    onSortingChange: (updater) => {
      const next = typeof updater === "function" ? updater(sorting) : updater;
      const s = next[0];
      setParams({ sort: s ? `${s.desc ? "-" : ""}${s.id}` : null, page: null });
    },
    onGlobalFilterChange: (value) => setParams({ q: String(value ?? ""), page: null }),
    onPaginationChange: (updater) => {
      const next = typeof updater === "function" ? updater({ pageIndex: page, pageSize }) : updater;
      setParams({ page: next.pageIndex ? String(next.pageIndex + 1) : null });
    },
    globalFilterFn: "includesString",
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
    getPaginationRowModel: getPaginationRowModel(),
    autoResetPageIndex: false,
  });

  function exportCsv() {
    const exponent = currencyExponent(currency);
    const shown = table.getPrePaginationRowModel().rows.map((r) => columns.map((c) => csvValue(c, r.original[c.key] ?? null, exponent)));
    const blob = new Blob([writeCsv(columns.map((c) => c.header), shown, { locale })], { type: "text/csv;charset=utf-8" });
    const a = document.createElement("a");
    a.href = URL.createObjectURL(blob);
    a.download = `${csvName}.csv`;
    a.click();
    URL.revokeObjectURL(a.href);
  }

  const count = table.getFilteredRowModel().rows.length;
  return (
    <div>
      <div className="mb-3 flex flex-wrap items-end gap-3">
        <label className="min-w-0 flex-1 basis-48">
          <span className="field-label">Search {label.toLowerCase()}</span>
          <input className="field-input" type="search" defaultValue={q} onChange={(e) => table.setGlobalFilter(e.target.value)} />
        </label>
        {filter ? (
          <label>
            <span className="field-label">{filter.label}</span>
            <select className="field-input" value={chosen} onChange={(e) => setParams({ [filter.key]: e.target.value || null, page: null })}>
              <option value="">All</option>
              {filter.options.map((o) => (
                <option key={o.value} value={o.value}>{o.label}</option>
              ))}
            </select>
          </label>
        ) : null}
        <button type="button" onClick={exportCsv} className="min-h-11 rounded border border-fin-600 bg-white px-4 py-2 font-bold text-fin-600 hover:bg-sand-50">
          Export CSV
        </button>
      </div>
      <div className="overflow-x-auto rounded border border-sand-300 bg-white" {...scrollArea(label)}>
        <table className="w-full min-w-[40rem] text-left text-sm" aria-label={label}>
          <thead className="bg-sand-200">
            {table.getHeaderGroups().map((hg) => (
              <tr key={hg.id}>
                {hg.headers.map((h) => {
                  const sorted = h.column.getIsSorted();
                  const spec = columns.find((c) => c.key === h.id);
                  return (
                    <th key={h.id} scope="col" aria-sort={sorted === "asc" ? "ascending" : sorted === "desc" ? "descending" : "none"} className={`px-3 py-2 ${spec?.kind === "money" ? "text-right" : ""}`}>
                      {h.column.getCanSort() ? (
                        <button type="button" className="font-bold" onClick={h.column.getToggleSortingHandler()}>
                          {flexRender(h.column.columnDef.header, h.getContext())}
                          <span aria-hidden="true">{sorted === "asc" ? " ↑" : sorted === "desc" ? " ↓" : ""}</span>
                        </button>
                      ) : null}
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody>
            {table.getRowModel().rows.map((row) => (
              <tr key={row.id} className="border-t border-sand-200">
                {row.getVisibleCells().map((cell) => {
                  const spec = columns.find((c) => c.key === cell.column.id);
                  return (
                    <td key={cell.id} className={`px-3 py-2 align-top ${spec?.kind === "money" ? "text-right" : ""}`}>{flexRender(cell.column.columnDef.cell, cell.getContext())}</td>
                  );
                })}
              </tr>
            ))}
            {count === 0 ? (
              <tr><td colSpan={defs.length} className="px-3 py-6 text-center text-ink-500">{emptyText}</td></tr>
            ) : null}
          </tbody>
        </table>
      </div>
      <div className="mt-3 flex flex-wrap items-center gap-3 text-sm">
        <button type="button" className="rounded border border-sand-500 px-3 py-1 disabled:opacity-40" onClick={() => table.previousPage()} disabled={!table.getCanPreviousPage()}>Previous</button>
        <span>Page {table.getState().pagination.pageIndex + 1} of {Math.max(1, table.getPageCount())} · {count} rows</span>
        <button type="button" className="rounded border border-sand-500 px-3 py-1 disabled:opacity-40" onClick={() => table.nextPage()} disabled={!table.getCanNextPage()}>Next</button>
      </div>
    </div>
  );
}
