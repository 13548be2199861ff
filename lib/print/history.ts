// The printable tire history of one vehicle, as plain rows: the same data
// feeds the print-laid-out page and the PDF. Built from the logbook view, so
// ages and conditions are the ones the app shows. No prices and no files:
// the sheet is meant for a shop visit or a buyer.
import { conditionLabel } from "@/components/ui/condition-badge";
import type { ConditionLevel } from "@/lib/visual/condition-code";
import { setTitle } from "@/components/logbook/format";
import type { VehicleLogbook } from "@/db/queries/logbook";
import { DEFAULT_PREFS, formatter, type Formatter } from "@/lib/format";
import { depthUnitFor } from "@/lib/units";
import { POSITION_LABELS, SERVICE_KIND_LABELS, SET_KIND_LABELS } from "@/lib/validation/labels";

export type PrintableHistory = {
  title: string;
  subtitle: string;
  printedOn: string;
  sets: {
    title: string;
    detail: string;
    condition: string;
    /** The level behind `condition`, for the condition code on the printed page (the PDF prints the word). */
    level: ConditionLevel | null;
    tires: { position: string; dotCode: string; made: string; age: string; condition: string; level: ConditionLevel | null }[];
  }[];
  lastChecks: { set: string; date: string; odometer: string; by: string; rows: { position: string; inner: string; centre: string; outer: string }[] }[];
  service: { date: string; kind: string; set: string; odometer: string; by: string; notes: string }[];
  cautions: string[];
};

const STATE = { mounted: "on the vehicle", stored: "stored", retired: "retired" } as const;

/** `f` formats in the reader's locale and zone (the page passes the viewer's). */
export function printableHistory(book: VehicleLogbook, today: string, f: Formatter = formatter(DEFAULT_PREFS)): PrintableHistory {
  const v = book.vehicle;
  const depthUnit = depthUnitFor(book.viewer.units);
  const distance = (km: number | null) => (km == null ? "—" : f.distance(km, v.odometerUnit));
  const setName = (id: string | null) => {
    const s = book.sets.find((x) => x.id === id);
    return s ? setTitle(s) : "—";
  };
  const positionOf = new Map(book.sets.flatMap((s) => s.tires.map((t) => [t.id, POSITION_LABELS[t.position]] as const)));
  const by = (e: { shopName: string | null; authorName: string | null }) =>
    e.shopName ? `${e.shopName}${e.authorName ? ` (${e.authorName})` : ""}` : (e.authorName ?? "The owner");
  const groove = (mm: number | null, approximate: boolean) => (mm == null ? "—" : `${approximate ? "about " : ""}${f.depth(mm, depthUnit)}`);

  return {
    title: v.nickname,
    subtitle: [`${v.make} ${v.model}`, v.year ? String(v.year) : null, v.vin ? `VIN ${v.vin}` : null, book.lastOdometer ? `${distance(book.lastOdometer.odometerKm)} on ${f.date(book.lastOdometer.date)}` : null]
      .filter(Boolean)
      .join(" · "),
    printedOn: f.date(today),
    sets: book.sets.map((s) => ({
      title: setTitle(s),
      detail: [SET_KIND_LABELS[s.kind], s.size, s.loadIndex != null || s.speedSymbol ? `${s.loadIndex ?? ""}${s.speedSymbol ?? ""}` : null, STATE[s.state], s.purchasedOn ? `bought ${f.date(s.purchasedOn)}` : null]
        .filter(Boolean)
        .join(" · "),
      condition: s.condition ? conditionLabel(s.condition) : "not enough data",
      level: s.condition ?? null,
      tires: s.tires.map((t) => ({
        position: POSITION_LABELS[t.position],
        dotCode: t.dotCode ?? "—",
        made: t.dot && t.dot.ok ? `week ${t.dot.week} of ${t.dot.year}` : "unknown",
        age: t.age ? f.age(t.age) : "age unknown",
        condition: t.condition ? conditionLabel(t.condition) : "—",
        level: t.condition ?? null,
      })),
    })),
    // The latest check of each set that has one, every groove of every tire.
    lastChecks: book.sets
      .map((s) => book.checks.find((c) => c.setId === s.id))
      .filter((c): c is VehicleLogbook["checks"][number] => !!c)
      .map((c) => ({
        set: setName(c.setId),
        date: f.date(c.checkedOn),
        odometer: distance(c.odometerKm),
        by: c.measuredBy === "shop" ? by(c) : (c.authorName ?? "The owner"),
        rows: c.readings.map((r) => ({
          position: positionOf.get(r.tireId) ?? "Tire",
          inner: groove(r.innerMm, r.approximate),
          centre: groove(r.centreMm, r.approximate),
          outer: groove(r.outerMm, r.approximate),
        })),
      })),
    service: book.service.map((s) => ({
      date: f.date(s.performedOn),
      kind: SERVICE_KIND_LABELS[s.kind],
      set: setName(s.setId),
      odometer: distance(s.odometerKm),
      by: by(s),
      notes: s.notes ?? "",
    })),
    cautions: [
      "These ages, depths and conditions are guidance computed from what was logged. Local law sets the legal minimum tread depth, and a qualified tire technician decides whether a tire is safe to use.",
      book.caution,
    ].filter((c, i, all) => c && all.indexOf(c) === i),
  };
}
