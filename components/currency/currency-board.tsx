"use client";
import { scrollArea } from "@/components/ui/scroll-area";
import {
  createColumnHelper, flexRender, getCoreRowModel, getFilteredRowModel, getSortedRowModel, useReactTable, type SortingState,
} from "@tanstack/react-table";
import { usePathname, useRouter, useSearchParams } from "next/navigation";
import { useMemo } from "react";
import { CURRENCY_STATE_LABELS, type CurrencyItem } from "@/lib/safety/currency-summary";
import { CurrencyStateBadge } from "./state-badge";

export type BoardRow = { userId: string; name: string; email: string; items: CurrencyItem[]; next: CurrencyItem | null; attention: number };

const col = createColumnHelper<BoardRow>();
const STATE_RANK = { expired: 0, missing: 1, expiring: 2, current: 3 } as const;

function Cell({ item, prefix }: { item: CurrencyItem | undefined; prefix?: string }) {
  if (!item) return <span className="text-ink-500">—</span>;
  return (
    <span className="flex flex-col items-start gap-1">
      <span className="flex flex-wrap items-center gap-1">{prefix ? <span className="text-xs">{prefix}</span> : null}<CurrencyStateBadge state={item.state} /></span>
      <span className="font-mono text-xs tabular text-ink-700">{item.lastDay ?? "—"}</span>
      {item.claim ? (
        <span className="text-xs text-ink-700">◇ Claimed: {CURRENCY_STATE_LABELS[item.claim.state].toLowerCase()}{item.claim.lastDay ? ` to ${item.claim.lastDay}` : ""}, not verified</span>
      ) : null}
    </span>
  );
}

/** The classes the club flies, as the items name them ("passenger_day:<class>"). */
function passengerClasses(rows: BoardRow[]): { key: string; label: string }[] {
  const first = rows[0]?.items ?? [];
  return first
    .filter((i) => i.key.startsWith("passenger_day"))
    .map((i) => ({ key: i.key.slice("passenger_day".length), label: i.label.includes(" — ") ? i.label.split(" — ")[1]! : "any aircraft" }));
}

const byKey = (row: BoardRow, key: string) => row.items.find((i) => i.key === key);
// Sort so that what lapsed comes first, then what ends soonest.
const itemSortValue = (item: CurrencyItem | undefined) => (item ? `${STATE_RANK[item.state]}-${item.lastDay ?? "0000"}` : "9");

export function CurrencyBoard({ rows }: { rows: BoardRow[] }) {
  const router = useRouter();
  const pathname = usePathname();
  const params = useSearchParams();
  const q = params.get("q") ?? "";
  const sortParam = params.get("sort") ?? "next";
  const sorting: SortingState = [{ id: sortParam.replace(/^-/, ""), desc: sortParam.startsWith("-") }];
  const classKeys = passengerClasses(rows).map((c) => `${c.key}|${c.label}`).join(",");
  const classes = useMemo(() => (classKeys ? classKeys.split(",").map((k) => ({ key: k.split("|")[0]!, label: k.split("|")[1]! })) : []), [classKeys]);

  function setParams(next: Record<string, string | null>) {
    const sp = new URLSearchParams(params.toString());
    for (const [k, v] of Object.entries(next)) {
      if (v === null || v === "") sp.delete(k);
      else sp.set(k, v);
    }
    router.replace(`${pathname}?${sp.toString()}`, { scroll: false });
  }

  const columns = useMemo(
    () => [
      col.accessor("name", { header: "Member", cell: (c) => <span><span className="font-bold">{c.getValue()}</span><span className="block break-all text-xs text-ink-500">{c.row.original.email}</span></span> }),
      col.accessor((r) => r.next?.lastDay ?? "9999-12-31", {
        id: "next",
        header: "Ends next",
        cell: (c) => {
          const n = c.row.original.next;
          return n ? <span><span className="block text-sm">{n.label}</span><span className="font-mono text-xs tabular">{n.lastDay}</span></span> : <span className="text-sm text-ink-500">Nothing running</span>;
        },
      }),
      col.accessor((r) => r.attention, { id: "attention", header: "Needs attention", cell: (c) => <span className="tabular">{c.getValue()}</span> }),
      // Passenger currency per category and class the club flies (14 CFR 61.57(a)(1)(i)).
      ...classes.map((cls, i) =>
        col.accessor((r) => itemSortValue(byKey(r, `passenger_day${cls.key}`)), {
          id: `passengers-${i}`,
          header: `Passengers: ${cls.label}`,
          cell: (c) => (
            <span className="flex flex-col gap-2">
              <Cell item={byKey(c.row.original, `passenger_day${cls.key}`)} prefix="Day" />
              <Cell item={byKey(c.row.original, `passenger_night${cls.key}`)} prefix="Night" />
            </span>
          ),
        }),
      ),
      col.accessor((r) => itemSortValue(byKey(r, "flight_review")), { id: "review", header: "Flight review", cell: (c) => <Cell item={byKey(c.row.original, "flight_review")} /> }),
      col.accessor((r) => itemSortValue(byKey(r, "medical")), { id: "medical", header: "Medical (expiry)", cell: (c) => <Cell item={byKey(c.row.original, "medical")} /> }),
      col.display({
        id: "recency",
        header: "Recency in type",
        cell: (c) => {
          const groups = c.row.original.items.filter((i) => i.key.startsWith("recency:"));
          if (groups.length === 0) return <span className="text-sm text-ink-500">No checkouts</span>;
          return (
            <ul className="flex flex-col gap-1">
              {groups.map((g) => (
                <li key={g.key} className="flex flex-wrap items-center gap-1 text-xs"><span>{g.label.replace(/^Recency in /, "")}</span><CurrencyStateBadge state={g.state} /></li>
              ))}
            </ul>
          );
        },
      }),
    ],
    [classes],
  );

  const table = useReactTable({
    data: rows,
    columns,
    state: { sorting, globalFilter: q },
    onSortingChange: (updater) => {
      const next = typeof updater === "function" ? updater(sorting) : updater;
      const s = next[0];
      setParams({ sort: s ? `${s.desc ? "-" : ""}${s.id}` : null });
    },
    onGlobalFilterChange: (value) => setParams({ q: String(value ?? "") }),
    globalFilterFn: (row, _id, value) => `${row.original.name} ${row.original.email}`.toLowerCase().includes(String(value).toLowerCase()),
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
  });

  return (
    <div>
      <label className="mb-3 block max-w-sm">
        <span className="field-label">Search</span>
        <input className="field-input" type="search" defaultValue={q} placeholder="Name or e-mail" onChange={(e) => table.setGlobalFilter(e.target.value)} />
      </label>
      <div className="overflow-x-auto rounded border border-sand-300 bg-white" {...scrollArea("Currency of members")}>
        <table className="w-full min-w-[60rem] text-left text-sm">
          <thead className="bg-sand-200">
            {table.getHeaderGroups().map((hg) => (
              <tr key={hg.id}>
                {hg.headers.map((h) => {
                  const sorted = h.column.getIsSorted();
                  return (
                    <th key={h.id} scope="col" aria-sort={sorted === "asc" ? "ascending" : sorted === "desc" ? "descending" : "none"} className="px-3 py-2 align-bottom">
                      {h.column.getCanSort() ? (
                        <button type="button" className="text-left font-bold" onClick={h.column.getToggleSortingHandler()}>
                          {flexRender(h.column.columnDef.header, h.getContext())}
                          <span aria-hidden="true">{sorted === "asc" ? " ↑" : sorted === "desc" ? " ↓" : ""}</span>
                        </button>
                      ) : (
                        <span className="font-bold">{flexRender(h.column.columnDef.header, h.getContext())}</span>
                      )}
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
            {table.getRowModel().rows.length === 0 ? <tr><td colSpan={columns.length} className="px-3 py-6 text-center text-ink-500">No members match.</td></tr> : null}
          </tbody>
        </table>
      </div>
    </div>
  );
}
