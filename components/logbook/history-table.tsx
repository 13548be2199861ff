"use client";
// The vehicle's history: tread checks and service entries in one table that
// sorts, filters and pages. Plain React state: a table library cost the
// vehicle page ~13 KiB of first-load JS for these few operations.
import { ArrowDown, ArrowUp, ArrowUpDown, Pencil, Trash2 } from "lucide-react";
import { ConfirmDialog } from "@/components/ui/confirm-dialog";
import { useMemo, useState, type ReactNode } from "react";
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

type SortKey = "date" | "type" | "setName" | "odometerKm" | "by";
type Sort = { id: SortKey; desc: boolean };
type Column = { id: keyof HistoryRow | "actions"; header: string; sortable: boolean };

export const HISTORY_PAGE_SIZE = 8;

const COLUMNS: Column[] = [
  { id: "date", header: "Date", sortable: true },
  { id: "type", header: "What", sortable: true },
  { id: "setName", header: "Set", sortable: true },
  { id: "odometerKm", header: "Odometer", sortable: true },
  { id: "details", header: "Details", sortable: false },
  { id: "by", header: "By", sortable: true },
];

const collator = new Intl.Collator(undefined, { numeric: true, sensitivity: "base" });

/** Rows that match the search (any column's text, as typed) and the type filter, in the chosen order. */
export function visibleHistory(rows: HistoryRow[], { search, type, sort }: { search: string; type: string; sort: Sort }): HistoryRow[] {
  const needle = search.toLowerCase();
  const matches = rows.filter(
    (r) =>
      (!type || r.type === type) &&
      (!needle || [r.date, r.type, r.setName, r.odometerKm, r.details, r.by].some((v) => v != null && String(v).toLowerCase().includes(needle))),
  );
  const dir = sort.desc ? -1 : 1;
  // Array.prototype.sort is stable: equal rows keep the logbook's order (newest first).
  return matches.sort((a, b) => {
    const x = a[sort.id];
    const y = b[sort.id];
    if (x == null || y == null) return x == null ? (y == null ? 0 : 1) : -1; // no odometer: last either way
    return dir * (typeof x === "number" && typeof y === "number" ? x - y : collator.compare(String(x), String(y)));
  });
}

/** A header's first click: text columns start A→Z (dates oldest first), numbers largest first. */
const firstDesc = (id: SortKey) => id === "odometerKm";

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
  /** Opens the row's edit form. */
  onEdit?: (row: HistoryRow) => void;
  /** The pointer or focus reached a row's edit button: a chance to start loading the form's code. */
  onEditIntent?: () => void;
}) {
  const [sort, setSort] = useState<Sort>({ id: "date", desc: true });
  const [typeFilter, setTypeFilter] = useState("");
  const [search, setSearch] = useState("");
  const [page, setPage] = useState(0);
  const f = useFormat();
  const types = useMemo(() => [...new Set(rows.map((r) => r.type))].sort(), [rows]);
  const visible = useMemo(() => visibleHistory(rows, { search, type: typeFilter, sort }), [rows, search, typeFilter, sort]);
  const shown = visible.length;
  const pageCount = Math.max(1, Math.ceil(shown / HISTORY_PAGE_SIZE));
  // A delete can empty the last page: show the one before it.
  const pageIndex = Math.min(page, pageCount - 1);
  const pageRows = visible.slice(pageIndex * HISTORY_PAGE_SIZE, (pageIndex + 1) * HISTORY_PAGE_SIZE);
  const columns: Column[] = onDelete ? [...COLUMNS, { id: "actions", header: "Actions", sortable: false }] : COLUMNS;
  const sortBy = (id: SortKey) => {
    setSort((s) => (s.id === id ? { id, desc: !s.desc } : { id, desc: firstDesc(id) }));
    setPage(0);
  };

  const cell = (row: HistoryRow, id: Column["id"]): ReactNode => {
    switch (id) {
      case "date":
        return <span className="whitespace-nowrap">{f.date(row.date)}</span>;
      case "odometerKm":
        return <span className="whitespace-nowrap">{f.distance(row.odometerKm, distanceUnit)}</span>;
      case "actions":
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
              onConfirm={() => onDelete!(row)}
            />
          </div>
        );
      default:
        return row[id];
    }
  };

  const hideOnPhone = (id: string) => (id === "setName" || id === "odometerKm" || id === "by" ? "hidden md:table-cell" : "");

  return (
    <div className="space-y-3" data-testid="history">
      <div className="grid gap-2 sm:grid-cols-[1fr_14rem]">
        <label className="block">
          <span className="text-sm font-semibold text-asphalt-800">Search the history</span>
          <Input value={search} onChange={(e) => { setSearch(e.target.value); setPage(0); }} placeholder="Shop, set, notes…" />
        </label>
        <label className="block">
          <span className="text-sm font-semibold text-asphalt-800">Show</span>
          <Select value={typeFilter} onChange={(e) => { setTypeFilter(e.target.value); setPage(0); }}>
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
            <tr>
              {columns.map((c) => {
                const sorted = sort.id === c.id ? (sort.desc ? "desc" : "asc") : null;
                return (
                  <th key={c.id} scope="col" className={`px-3 py-2 font-semibold ${hideOnPhone(c.id)}`} aria-sort={sorted === "asc" ? "ascending" : sorted === "desc" ? "descending" : undefined}>
                    {c.id === "actions" ? (
                      <span className="sr-only">{c.header}</span>
                    ) : c.sortable ? (
                      <button type="button" className="inline-flex min-h-9 items-center gap-1" onClick={() => sortBy(c.id as SortKey)}>
                        {c.header}
                        {sorted === "asc" ? <ArrowUp aria-hidden className="size-3.5" /> : sorted === "desc" ? <ArrowDown aria-hidden className="size-3.5" /> : <ArrowUpDown aria-hidden className="size-3.5 text-asphalt-500" />}
                      </button>
                    ) : (
                      c.header
                    )}
                  </th>
                );
              })}
            </tr>
          </thead>
          <tbody>
            {pageRows.map((r) => (
              <tr key={r.id} className="border-t border-asphalt-200 align-top" data-testid="history-row">
                {columns.map((c) => (
                  <td key={c.id} className={`px-3 py-2 ${hideOnPhone(c.id)}`}>
                    {cell(r, c.id)}
                    {c.id === "details" ? (
                      <span className="mt-1 block text-asphalt-600 md:hidden">
                        {[r.setName, r.odometerKm != null ? f.distance(r.odometerKm, distanceUnit) : null, r.by].filter(Boolean).join(" · ")}
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
          Page {f.number(pageIndex + 1)} of {f.number(pageCount)} · {f.count(shown, { one: "entry", other: "entries" })}
        </span>
        <div className="flex gap-2">
          <Button type="button" variant="secondary" size="sm" onClick={() => setPage(pageIndex - 1)} disabled={pageIndex === 0}>
            Previous page
          </Button>
          <Button type="button" variant="secondary" size="sm" onClick={() => setPage(pageIndex + 1)} disabled={pageIndex >= pageCount - 1}>
            Next page
          </Button>
        </div>
      </div>
    </div>
  );
}
