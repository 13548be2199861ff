"use client";
// One set: each tire's age, depth, wear pattern and projection, the wear
// chart, the readings table and the set's own limits.
import type { SetKind } from "@/lib/tires";
import { useQuery } from "@tanstack/react-query";
import { QueryIsland } from "./query-island";
import Link from "next/link";
import { useRef, useState } from "react";
import { Button } from "@/components/ui/button";
import { Alert } from "@/components/ui/alert";
import { buttonVariants } from "@/components/ui/button-variants";
import { Card, CardTitle } from "@/components/ui/card";
import { ConditionBadge } from "@/components/ui/condition-badge";
import { PageHeader } from "@/components/ui/page-header";
import { SafetyNote } from "@/components/ui/safety-note";
import type { SetDetail } from "@/db/queries/logbook";
import { depthUnitFor, } from "@/lib/units";
import { POSITION_LABELS, SET_KIND_LABELS } from "@/lib/validation/labels";
import { api, keys } from "./api";
import { linkClass, setTitle } from "./format";
import { useFormat } from "@/components/format/format-provider";
// The forms that open on request load their code (and zod, react-hook-form) when opened.
import { EditCheck, SetSettings, preloadEditEntry } from "./lazy-forms";
import { TireList } from "./tire-list";
import { WearChart } from "./wear-chart";

export function SetDetailView(props: { initial: SetDetail; saved?: string }) {
  return (
    <QueryIsland>
      <SetDetailBody {...props} />
    </QueryIsland>
  );
}

function SetDetailBody({ initial, saved }: { initial: SetDetail; saved?: string }) {
  const f = useFormat();
  const { data } = useQuery({ queryKey: keys.set(initial.set.id), queryFn: () => api<SetDetail>(`/api/sets/${initial.set.id}`), initialData: initial });
  const d = data ?? initial;
  const s = d.set;
  const depthUnit = depthUnitFor(d.viewer.units);
  const distanceUnit = d.vehicle.odometerUnit;
  const state = s.state === "mounted" ? "on the car" : s.state === "stored" ? `stored${s.storageLocation ? ` at ${s.storageLocation}` : ""}` : "retired";
  const positionOf = new Map(s.tires.map((t) => [t.id, POSITION_LABELS[t.position]]));
  const [showAll, setShowAll] = useState(false);
  // A check being changed: the recording form, filled in, above the readings.
  const [editingId, setEditingId] = useState<string | null>(null);
  const editRef = useRef<HTMLDivElement>(null);
  const editing = d.checks.find((c) => c.id === editingId);

  return (
    <>
      <PageHeader
        title={setTitle(s)}
        description={
          <>
            <Link href={`/vehicles/${d.vehicle.id}`} className={linkClass}>{d.vehicle.nickname}</Link> · {SET_KIND_LABELS[s.kind]} · {s.size} · {state}
          </>
        }
        actions={
          s.state !== "retired" ? (
            <Link href={`/vehicles/${d.vehicle.id}/check?set=${s.id}`} className={buttonVariants()}>
              Record a tread check
            </Link>
          ) : null
        }
      />
      {saved === "check" ? <Alert tone="success" className="mb-4">The tread check is saved; the chart includes it.</Alert> : null}
      <div className="mb-6 grid gap-4 lg:grid-cols-[2fr_1fr]">
        <Card className="space-y-3">
          <CardTitle>Wear chart</CardTitle>
          <WearChart tires={s.tires} limitMm={s.limit.minMm} limitSource={s.limit.source} depthUnit={depthUnit} distanceUnit={distanceUnit} />
        </Card>
        <Card className="space-y-3">
          <CardTitle>The set</CardTitle>
          <div className="flex items-center gap-2">{s.condition ? <ConditionBadge condition={s.condition} detail="worst tire" /> : <span>No condition yet.</span>}</div>
          <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-1 text-sm">
            <dt className="text-asphalt-600">Depth limit</dt>
            <dd>
              {f.depth(s.limit.minMm, depthUnit)} — {s.limit.source}
              {s.limit.legal ? " (legal minimum)" : ""}
            </dd>
            <dt className="text-asphalt-600">Bought</dt>
            <dd>
              {f.date(s.purchasedOn)}
              {s.seller ? ` from ${s.seller}` : ""}
            </dd>
            <dt className="text-asphalt-600">Price</dt>
            <dd>{f.money(s.priceCents, s.currency)}</dd>
          </dl>
          {s.limit.note ? <p className="text-xs text-asphalt-600">{s.limit.note}</p> : null}
          {s.axleAdvice.length ? (
            <ul className="list-disc pl-5 text-sm">
              {s.axleAdvice.map((a) => (
                <li key={a}>{a}</li>
              ))}
            </ul>
          ) : null}
          <SafetyNote compact />
          <SetSettings set={s} vehicleId={d.vehicle.id} />
        </Card>
      </div>

      <section aria-labelledby="tires-h" className="mb-6 space-y-3">
        <h2 id="tires-h" className="text-xl font-bold">
          Each tire
        </h2>
        <TireList tires={s.tires} depthUnit={depthUnit} showPattern limitMm={s.limit.minMm} edit={{ vehicleId: d.vehicle.id, setId: s.id, kind: s.kind.replace("_", "-") as SetKind }} />
        {s.tires.some((t) => t.ageReason || t.depthReason) ? (
          <details className="rounded border border-asphalt-200 bg-white p-3 text-sm">
            <summary className="cursor-pointer font-semibold">Why each condition</summary>
            <ul className="mt-2 space-y-1">
              {s.tires.map((t) => (
                <li key={t.id}>
                  <strong>{POSITION_LABELS[t.position]}:</strong> {[t.ageReason, t.depthReason].filter(Boolean).join(" ")}
                </li>
              ))}
            </ul>
          </details>
        ) : null}
      </section>

      <section aria-labelledby="readings-h" className="mb-6 space-y-3">
        <h2 id="readings-h" className="text-xl font-bold">
          Readings
        </h2>
        {editing ? (
          <div ref={editRef} tabIndex={-1} className="scroll-mt-24 outline-none" data-testid="edit-entry">
            <Card className="space-y-3 border-groove-300">
              <h3 className="text-lg font-bold">Change the tread check of {f.date(editing.checkedOn)}</h3>
              <EditCheck
                key={editing.id}
                check={editing}
                url={`/api/checks/${editing.id}`}
                vehicle={{ id: d.vehicle.id, nickname: d.vehicle.nickname, odometerUnit: distanceUnit }}
                sets={[s]}
                depthUnit={depthUnit}
                pressureUnit={d.viewer.pressureUnit}
                onDone={() => setEditingId(null)}
              />
            </Card>
          </div>
        ) : null}
        {d.checks.length === 0 ? (
          <p className="text-asphalt-600">No checks yet.</p>
        ) : (
          <div className="rounded border border-asphalt-200">
            <table className="w-full text-left text-sm" data-testid="readings-table">
              <thead className="bg-asphalt-100">
                <tr>
                  <th scope="col" className="px-3 py-2">Date</th>
                  <th scope="col" className="hidden px-3 py-2 md:table-cell">Odometer</th>
                  <th scope="col" className="px-3 py-2">Tire</th>
                  <th scope="col" className="px-3 py-2">Inner · centre · outer</th>
                  <th scope="col" className="hidden px-3 py-2 md:table-cell">Pressure</th>
                  <th scope="col" className="hidden px-3 py-2 md:table-cell">By</th>
                </tr>
              </thead>
              <tbody>
                {(showAll ? d.checks : d.checks.slice(0, 3)).flatMap((c) =>
                  c.readings.map((r, i) => (
                    <tr key={`${c.id}-${r.tireId}`} className="border-t border-asphalt-200">
                      <td className="px-3 py-2 whitespace-nowrap">
                        {f.date(c.checkedOn)}
                        {i === 0 ? (
                          <Button
                            type="button"
                            size="sm"
                            variant="ghost"
                            className="ml-1"
                            onPointerEnter={preloadEditEntry}
                            onFocus={preloadEditEntry}
                            onClick={() => {
                              setEditingId(c.id);
                              requestAnimationFrame(() => {
                                editRef.current?.scrollIntoView({ block: "start", behavior: "smooth" });
                                editRef.current?.focus({ preventScroll: true });
                              });
                            }}
                          >
                            Change<span className="sr-only"> the tread check of {f.date(c.checkedOn)}</span>
                          </Button>
                        ) : null}
                      </td>
                      <td className="hidden px-3 py-2 whitespace-nowrap md:table-cell">{f.distance(c.odometerKm, distanceUnit)}</td>
                      <td className="px-3 py-2">{positionOf.get(r.tireId) ?? "—"}</td>
                      <td className="px-3 py-2">
                        {r.approximate
                          ? `about ${f.depth(r.centreMm, depthUnit)} (coin)`
                          : [r.innerMm, r.centreMm, r.outerMm].map((x) => f.depth(x, depthUnit)).join(" · ")}
                        <span className="mt-1 block text-asphalt-600 md:hidden">
                          {[f.distance(c.odometerKm, distanceUnit), r.pressureKpa != null ? f.pressure(r.pressureKpa, d.viewer.pressureUnit) : null, c.measuredBy === "shop" ? (c.shopName ?? "A shop") : "You"].filter(Boolean).join(" · ")}
                        </span>
                      </td>
                      <td className="hidden px-3 py-2 md:table-cell">{f.pressure(r.pressureKpa, d.viewer.pressureUnit)}</td>
                      <td className="hidden px-3 py-2 md:table-cell">{c.measuredBy === "shop" ? (c.shopName ?? "A shop") : "You"}</td>
                    </tr>
                  )),
                )}
              </tbody>
            </table>
          </div>
        )}
        {d.checks.length > 3 ? (
          <Button type="button" variant="secondary" size="sm" onClick={() => setShowAll((x) => !x)} aria-expanded={showAll}>
            {showAll ? "Show the latest three checks" : `Show all ${f.count(d.checks.length, { one: "check", other: "checks" })}`}
          </Button>
        ) : null}
      </section>
    </>
  );
}
