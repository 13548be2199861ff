"use client";
// The vehicle's history: tread checks and service entries in one table that
// sorts, filters and pages (TanStack Table).
import {
  flexRender,
  getCoreRowModel,
  getFilteredRowModel,
  getPaginationRowModel,
  getSortedRowModel,
  useReactTable,
  type ColumnDef,
  type SortingState,
} from "@tanstack/react-table";
import { ArrowDown, ArrowUp, ArrowUpDown } from "lucide-react";
import { useMemo, useState } from "react";
import { Button } from "@/components/ui/button";
import { Input, Select } from "@/components/ui/field";
import type { VehicleLogbook } from "@/db/queries/logbook";
import { formatDepth, formatDistance, type DepthUnit, type DistanceUnit } from "@/lib/units";
import { POSITION_LABELS, SERVICE_KIND_LABELS } from "@/lib/validation/logbook";
import { formatDate, formatMoney, setTitle } from "./format";

export type HistoryRow = {
  id: string;
  date: string;
  type: string;
  setName: string;
  odometerKm: number | null;
  details: string;
  by: string;
};

export function historyRows(book: VehicleLogbook, depthUnit: DepthUnit): HistoryRow[] {
  const setName = (id: string | null) => {
    const s = book.sets.find((x) => x.id === id);
    return s ? setTitle(s) : "—";
  };
  const positionOf = new Map(book.sets.flatMap((s) => s.tires.map((t) => [t.id, POSITION_LABELS[t.position]] as const)));
  const checks: HistoryRow[] = book.checks.map((c) => ({
    id: `c-${c.id}`,
    date: c.checkedOn,
    type: c.method === "coin" ? "Tread check (coin)" : "Tread check",
    setName: setName(c.setId),
    odometerKm: c.odometerKm,
    details: c.readings
      .map((r) => {
        const grooves = [r.innerMm, r.centreMm, r.outerMm].filter((x): x is number => x != null);
        const min = grooves.length ? Math.min(...grooves) : null;
        return `${positionOf.get(r.tireId) ?? "Tire"} ${r.approximate ? "≈" : ""}${formatDepth(min, depthUnit)}`;
      })
      .join(" · "),
    by: c.measuredBy === "shop" ? (c.shopName ?? "A shop") : c.byViewer ? "You" : (c.authorName ?? "The owner"),
  }));
  const service: HistoryRow[] = book.service.map((s) => ({
    id: `s-${s.id}`,
    date: s.performedOn,
    type: SERVICE_KIND_LABELS[s.kind],
    setName: setName(s.setId),
    odometerKm: s.odometerKm,
    details: [s.notes, s.costCents != null ? formatMoney(s.costCents, book.sets.find((x) => x.id === s.setId)?.currency ?? "EUR") : null].filter(Boolean).join(" · "),
    by: s.shopName ?? (s.byViewer ? "You" : (s.authorName ?? "The owner")),
  }));
  return [...checks, ...service].sort((a, b) => b.date.localeCompare(a.date));
}

export function HistoryTable({ rows, distanceUnit }: { rows: HistoryRow[]; distanceUnit: DistanceUnit }) {
  const [sorting, setSorting] = useState<SortingState>([{ id: "date", desc: true }]);
  const [typeFilter, setTypeFilter] = useState("");
  const [search, setSearch] = useState("");
  const types = useMemo(() => [...new Set(rows.map((r) => r.type))].sort(), [rows]);
  const columns = useMemo<ColumnDef<HistoryRow>[]>(
    () => [
      { accessorKey: "date", header: "Date", cell: (c) => <span className="whitespace-nowrap">{formatDate(c.getValue<string>())}</span> },
      { accessorKey: "type", header: "What", filterFn: (row, id, value) => !value || row.getValue(id) === value },
      { accessorKey: "setName", header: "Set" },
      {
        accessorKey: "odometerKm",
        header: "Odometer",
        sortUndefined: "last",
        cell: (c) => <span className="whitespace-nowrap">{formatDistance(c.getValue<number | null>(), distanceUnit)}</span>,
      },
      { accessorKey: "details", header: "Details", enableSorting: false },
      { accessorKey: "by", header: "By" },
    ],
    [distanceUnit],
  );
  const table = useReactTable({
    data: rows,
    columns,
    state: { sorting, globalFilter: search, columnFilters: typeFilter ? [{ id: "type", value: typeFilter }] : [] },
    onSortingChange: setSorting,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
    getPaginationRowModel: getPaginationRowModel(),
    globalFilterFn: "includesString",
    initialState: { pagination: { pageSize: 8 } },
  });
  const shown = table.getFilteredRowModel().rows.length;

  return (
    <div className="space-y-3">
      <div className="grid gap-2 sm:grid-cols-[1fr_14rem]">
        <label className="block">
          <span className="text-sm font-semibold text-asphalt-800">Search the history</span>
          <Input value={search} onChange={(e) => { setSearch(e.target.value); table.setPageIndex(0); }} placeholder="Shop, set, notes…" />
        </label>
        <label className="block">
          <span className="text-sm font-semibold text-asphalt-800">Show</span>
          <Select value={typeFilter} onChange={(e) => { setTypeFilter(e.target.value); table.setPageIndex(0); }}>
            <option value="">Everything</option>
            {types.map((t) => (
              <option key={t} value={t}>
                {t}
              </option>
            ))}
          </Select>
        </label>
      </div>
      <div className="overflow-x-auto rounded border border-asphalt-200">
        <table className="w-full min-w-[40rem] text-left text-sm">
          <caption className="sr-only">Tread checks and service entries, {shown} rows</caption>
          <thead className="bg-asphalt-100 text-asphalt-800">
            {table.getHeaderGroups().map((hg) => (
              <tr key={hg.id}>
                {hg.headers.map((h) => {
                  const sorted = h.column.getIsSorted();
                  return (
                    <th key={h.id} scope="col" className="px-3 py-2 font-semibold" aria-sort={sorted === "asc" ? "ascending" : sorted === "desc" ? "descending" : undefined}>
                      {h.column.getCanSort() ? (
                        <button type="button" className="inline-flex min-h-9 items-center gap-1" onClick={h.column.getToggleSortingHandler()}>
                          {flexRender(h.column.columnDef.header, h.getContext())}
                          {sorted === "asc" ? <ArrowUp aria-hidden className="size-3.5" /> : sorted === "desc" ? <ArrowDown aria-hidden className="size-3.5" /> : <ArrowUpDown aria-hidden className="size-3.5 text-asphalt-400" />}
                        </button>
                      ) : (
                        flexRender(h.column.columnDef.header, h.getContext())
                      )}
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody>
            {table.getRowModel().rows.map((r) => (
              <tr key={r.id} className="border-t border-asphalt-200 align-top">
                {r.getVisibleCells().map((c) => (
                  <td key={c.id} className="px-3 py-2">
                    {flexRender(c.column.columnDef.cell, c.getContext())}
                  </td>
                ))}
              </tr>
            ))}
            {shown === 0 ? (
              <tr>
                <td colSpan={6} className="px-3 py-4 text-asphalt-600">
                  Nothing matches.
                </td>
              </tr>
            ) : null}
          </tbody>
        </table>
      </div>
      <div className="flex items-center justify-between gap-2 text-sm">
        <span aria-live="polite">
          Page {table.getState().pagination.pageIndex + 1} of {Math.max(1, table.getPageCount())} · {shown} entries
        </span>
        <div className="flex gap-2">
          <Button type="button" variant="secondary" size="sm" onClick={() => table.previousPage()} disabled={!table.getCanPreviousPage()}>
            Previous page
          </Button>
          <Button type="button" variant="secondary" size="sm" onClick={() => table.nextPage()} disabled={!table.getCanNextPage()}>
            Next page
          </Button>
        </div>
      </div>
    </div>
  );
}
