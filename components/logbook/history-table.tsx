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
  type ColumnFiltersState,
  type PaginationState,
  type SortingState,
} from "@tanstack/react-table";
import { ArrowDown, ArrowUp, ArrowUpDown, Pencil, Trash2 } from "lucide-react";
import { ConfirmDialog } from "@/components/ui/confirm-dialog";
import { useMemo, useState } from "react";
import { Button } from "@/components/ui/button";
import { Input, Select } from "@/components/ui/field";
import type { VehicleLogbook } from "@/db/queries/logbook";
import { useFormat } from "@/components/format/format-provider";
import type { Formatter } from "@/lib/format";
import type { DepthUnit, DistanceUnit } from "@/lib/units";
import { POSITION_LABELS, SERVICE_KIND_LABELS } from "@/lib/validation/labels";
import { setTitle } from "./format";

export type HistoryRow = {
  id: string;
  date: string;
  type: string;
  setName: string;
  odometerKm: number | null;
  details: string;
  by: string;
};

export function historyRows(book: VehicleLogbook, depthUnit: DepthUnit, f: Formatter): HistoryRow[] {
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
        return `${positionOf.get(r.tireId) ?? "Tire"} ${r.approximate ? "≈" : ""}${f.depth(min, depthUnit)}`;
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
    details: [s.notes, s.costCents != null ? f.money(s.costCents, book.sets.find((x) => x.id === s.setId)?.currency ?? "EUR") : null].filter(Boolean).join(" · "),
    by: s.shopName ?? (s.byViewer ? "You" : (s.authorName ?? "The owner")),
  }));
  return [...checks, ...service].sort((a, b) => b.date.localeCompare(a.date));
}

/**
 * Every input of `useReactTable` is kept referentially stable, and the page
 * index is ours, not the table's. The table recomputes its filtered rows when
 * the `columnFilters` array or `data` changes identity and then *resets the
 * page index* through a state update (autoResetPageIndex): a fresh array made
 * during render therefore re-renders, makes another array, resets again, and
 * the tab spins at full CPU. The React Compiler lint reports the hook as an
 * incompatible library, so nothing here may rely on the compiler memoising.
 */
export function HistoryTable({
  rows,
  distanceUnit,
  onDelete,
  onEdit,
  onEditIntent,
}: {
  rows: HistoryRow[];
  distanceUnit: DistanceUnit;
  onDelete?: (row: HistoryRow) => Promise<void>;
  /** Opens the row's edit form (kept stable by the caller, like onDelete). */
  onEdit?: (row: HistoryRow) => void;
  /** The pointer or focus reached a row's edit button: a chance to start loading the form's code. */
  onEditIntent?: () => void;
}) {
  const [sorting, setSorting] = useState<SortingState>([{ id: "date", desc: true }]);
  const [typeFilter, setTypeFilter] = useState("");
  const [search, setSearch] = useState("");
  const f = useFormat();
  const [pagination, setPagination] = useState<PaginationState>({ pageIndex: 0, pageSize: 8 });
  const columnFilters = useMemo<ColumnFiltersState>(() => (typeFilter ? [{ id: "type", value: typeFilter }] : []), [typeFilter]);
  const types = useMemo(() => [...new Set(rows.map((r) => r.type))].sort(), [rows]);
  const columns = useMemo<ColumnDef<HistoryRow>[]>(
    () => [
      { accessorKey: "date", header: "Date", cell: (c) => <span className="whitespace-nowrap">{f.date(c.getValue<string>())}</span> },
      { accessorKey: "type", header: "What", filterFn: (row, id, value) => !value || row.getValue(id) === value },
      { accessorKey: "setName", header: "Set" },
      {
        accessorKey: "odometerKm",
        header: "Odometer",
        sortUndefined: "last",
        cell: (c) => <span className="whitespace-nowrap">{f.distance(c.getValue<number | null>(), distanceUnit)}</span>,
      },
      { accessorKey: "details", header: "Details", enableSorting: false },
      { accessorKey: "by", header: "By" },
      ...(onDelete
        ? [
            {
              id: "actions",
              header: () => <span className="sr-only">Actions</span>,
              enableSorting: false,
              cell: (c) => {
                const row = c.row.original;
                return (
                  <div className="flex flex-col md:flex-row">
                  {onEdit ? (
                    <button type="button" className="inline-flex size-9 items-center justify-center rounded text-asphalt-700 hover:bg-asphalt-100" aria-label={`Change: ${row.type}, ${f.date(row.date)}`} onPointerEnter={onEditIntent} onFocus={onEditIntent} onClick={() => onEdit(row)}>
                      <Pencil aria-hidden className="size-4" />
                    </button>
                  ) : null}
                  <ConfirmDialog
                    trigger={
                      <button type="button" className="inline-flex size-9 items-center justify-center rounded text-asphalt-700 hover:bg-asphalt-100" aria-label={`Delete: ${row.type}, ${f.date(row.date)}`}>
                        <Trash2 aria-hidden className="size-4" />
                      </button>
                    }
                    title={`Delete this ${row.type.toLowerCase()}?`}
                    description={
                      <p>
                        {row.type} of {f.date(row.date)}
                        {row.details ? ` (${row.details})` : ""} leaves the history
                        {row.id.startsWith("c-") ? ", and its readings leave the wear chart and the projections" : "; tread checks taken with it stay as checks of their own, and its files are deleted"}. This cannot be undone.
                      </p>
                    }
                    confirmLabel="Delete the entry"
                    onConfirm={() => onDelete(row)}
                  />
                  </div>
                );
              },
            } satisfies ColumnDef<HistoryRow>,
          ]
        : []),
    ],
    [distanceUnit, f, onDelete, onEdit, onEditIntent],
  );
  // eslint-disable-next-line react-hooks/incompatible-library -- the inputs are stable by hand (see above); the compiler is not enabled
  const table = useReactTable({
    data: rows,
    columns,
    state: { sorting, globalFilter: search, columnFilters, pagination },
    onSortingChange: (u) => {
      setSorting(u);
      setPagination((p) => (p.pageIndex === 0 ? p : { ...p, pageIndex: 0 }));
    },
    onPaginationChange: setPagination,
    autoResetPageIndex: false,
    // A header click goes between ascending and descending; the history never sits unsorted.
    enableSortingRemoval: false,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
    getPaginationRowModel: getPaginationRowModel(),
    globalFilterFn: "includesString",
  });
  const shown = table.getFilteredRowModel().rows.length;

  const hideOnPhone = (id: string) => (id === "setName" || id === "odometerKm" || id === "by" ? "hidden md:table-cell" : "");

  return (
    <div className="space-y-3" data-testid="history">
      <div className="grid gap-2 sm:grid-cols-[1fr_14rem]">
        <label className="block">
          <span className="text-sm font-semibold text-asphalt-800">Search the history</span>
          <Input value={search} onChange={(e) => { setSearch(e.target.value); setPagination((p) => ({ ...p, pageIndex: 0 })); }} placeholder="Shop, set, notes…" />
        </label>
        <label className="block">
          <span className="text-sm font-semibold text-asphalt-800">Show</span>
          <Select value={typeFilter} onChange={(e) => { setTypeFilter(e.target.value); setPagination((p) => ({ ...p, pageIndex: 0 })); }}>
            <option value="">Everything</option>
            {types.map((t) => (
              <option key={t} value={t}>
                {t}
              </option>
            ))}
          </Select>
        </label>
      </div>
      {/* On a phone the set, odometer and author move under the details, so nothing scrolls sideways. */}
      <div className="rounded border border-asphalt-200">
        <table className="w-full text-left text-sm">
          <caption className="sr-only">Tread checks and service entries, {f.count(shown, { one: "row", other: "rows" })}</caption>
          <thead className="bg-asphalt-100 text-asphalt-800">
            {table.getHeaderGroups().map((hg) => (
              <tr key={hg.id}>
                {hg.headers.map((h) => {
                  const sorted = h.column.getIsSorted();
                  return (
                    <th key={h.id} scope="col" className={`px-3 py-2 font-semibold ${hideOnPhone(h.column.id)}`} aria-sort={sorted === "asc" ? "ascending" : sorted === "desc" ? "descending" : undefined}>
                      {h.column.getCanSort() ? (
                        <button type="button" className="inline-flex min-h-9 items-center gap-1" onClick={h.column.getToggleSortingHandler()}>
                          {flexRender(h.column.columnDef.header, h.getContext())}
                          {sorted === "asc" ? <ArrowUp aria-hidden className="size-3.5" /> : sorted === "desc" ? <ArrowDown aria-hidden className="size-3.5" /> : <ArrowUpDown aria-hidden className="size-3.5 text-asphalt-500" />}
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
              <tr key={r.id} className="border-t border-asphalt-200 align-top" data-testid="history-row">
                {r.getVisibleCells().map((c) => (
                  <td key={c.id} className={`px-3 py-2 ${hideOnPhone(c.column.id)}`}>
                    {flexRender(c.column.columnDef.cell, c.getContext())}
                    {c.column.id === "details" ? (
                      <span className="mt-1 block text-asphalt-600 md:hidden">
                        {[r.original.setName, r.original.odometerKm != null ? f.distance(r.original.odometerKm, distanceUnit) : null, r.original.by].filter(Boolean).join(" · ")}
                      </span>
                    ) : null}
                  </td>
                ))}
              </tr>
            ))}
            {shown === 0 ? (
              <tr>
                <td colSpan={columns.length} className="px-3 py-4 text-asphalt-600">
                  Nothing matches.
                </td>
              </tr>
            ) : null}
          </tbody>
        </table>
      </div>
      <div className="flex flex-wrap items-center justify-between gap-2 text-sm">
        <span aria-live="polite" data-testid="history-status">
          Page {f.number(table.getState().pagination.pageIndex + 1)} of {f.number(Math.max(1, table.getPageCount()))} · {f.count(shown, { one: "entry", other: "entries" })}
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
