// The vehicle history's search, filter and order, now plain code instead of a
// table library: what the driver sees when a header is pressed or text typed.
import { describe, expect, it } from "vitest";
import { visibleHistory, type HistoryRow } from "@/components/logbook/history-table";

const row = (id: string, date: string, type: string, odometerKm: number | null, details = "", by = "You"): HistoryRow => ({ id, date, type, setName: "Summer set", odometerKm, details, by });
// In the logbook's own order: newest first.
const rows = [
  row("c-3", "2026-11-03", "Tread check", 41_200, "Front left 5.2 mm"),
  row("s-2", "2026-10-01", "Alignment", null, "Toe corrected", "Example Tread Works"),
  row("c-2", "2026-06-15", "Tread check", 35_000),
  row("s-1", "2026-03-30", "Fitting", 30_500, "", "Example Tread Works"),
  row("c-1", "2026-03-30", "Tread check", 30_500),
];
const ids = (r: HistoryRow[]) => r.map((x) => x.id);
const all = { search: "", type: "" };

describe("vehicle history table", () => {
  it("orders by date either way, equal dates keeping the logbook's order", () => {
    expect(ids(visibleHistory(rows, { ...all, sort: { id: "date", desc: true } }))).toEqual(["c-3", "s-2", "c-2", "s-1", "c-1"]);
    expect(ids(visibleHistory(rows, { ...all, sort: { id: "date", desc: false } }))).toEqual(["s-1", "c-1", "c-2", "s-2", "c-3"]);
  });

  it("puts an entry without an odometer last in both directions", () => {
    expect(ids(visibleHistory(rows, { ...all, sort: { id: "odometerKm", desc: true } }))).toEqual(["c-3", "c-2", "s-1", "c-1", "s-2"]);
    expect(ids(visibleHistory(rows, { ...all, sort: { id: "odometerKm", desc: false } }))).toEqual(["s-1", "c-1", "c-2", "c-3", "s-2"]);
  });

  it("orders text columns alphabetically, ignoring case", () => {
    const mixed = [row("a", "2026-01-01", "tread check", 1), row("b", "2026-01-02", "Alignment", 2), row("c", "2026-01-03", "Fitting", 3)];
    expect(ids(visibleHistory(mixed, { ...all, sort: { id: "type", desc: false } }))).toEqual(["b", "c", "a"]);
  });

  it("searches every column's text without regard to case, and filters by kind exactly", () => {
    const byDate = { id: "date", desc: true } as const;
    expect(ids(visibleHistory(rows, { search: "TREAD WORKS", type: "", sort: byDate }))).toEqual(["s-2", "s-1"]);
    expect(ids(visibleHistory(rows, { search: "5.2 mm", type: "", sort: byDate }))).toEqual(["c-3"]);
    expect(ids(visibleHistory(rows, { search: "2026-06", type: "", sort: byDate }))).toEqual(["c-2"]);
    expect(ids(visibleHistory(rows, { search: "35000", type: "", sort: byDate }))).toEqual(["c-2"]);
    expect(ids(visibleHistory(rows, { search: "", type: "Tread check", sort: byDate }))).toEqual(["c-3", "c-2", "c-1"]);
    expect(ids(visibleHistory(rows, { search: "works", type: "Fitting", sort: byDate }))).toEqual(["s-1"]);
    expect(visibleHistory(rows, { search: "no such text", type: "", sort: byDate })).toEqual([]);
  });

  it("leaves the rows it was given in their order", () => {
    const before = ids(rows);
    visibleHistory(rows, { ...all, sort: { id: "date", desc: false } });
    expect(ids(rows)).toEqual(before);
  });
});
