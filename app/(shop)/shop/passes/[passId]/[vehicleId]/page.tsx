import type { Metadata } from "next";
import { Paperclip, PencilLine } from "lucide-react";
import Link from "next/link";
import { notFound } from "next/navigation";
import { PassClosed } from "@/components/passes/pass-closed";
import { PassEntryControls } from "@/components/passes/pass-entry-controls";
import { ShopFittedSetForm } from "@/components/passes/shop-fitted-set-form";
import { ShopServiceForm } from "@/components/passes/shop-service-form";
import { TimeLeft } from "@/components/passes/time-left";
import { Card } from "@/components/ui/card";
import { ConditionBadge } from "@/components/ui/condition-badge";
import { VehiclePlan } from "@/components/passes/vehicle-plan";
import { SafetyNote } from "@/components/ui/safety-note";
import { getVehicleLogbook, type SetView } from "@/db/queries/logbook";
import { resolvePassAccess } from "@/db/queries/passes";
import { getSession } from "@/lib/auth/session";
import { AppError } from "@/lib/errors";
import { depthUnitFor } from "@/lib/units";
import { viewerFormat } from "@/lib/format/server";
import { POSITION_LABELS, SERVICE_KIND_LABELS, SET_KIND_LABELS, todayIso } from "@/lib/validation/logbook";
import { SCOPE_LABEL } from "@/lib/validation/passes";

export const metadata: Metadata = { title: "Logbook under a pass" };

export const dynamic = "force-dynamic";

function setTitle(s: SetView) {
  return s.label ?? `${SET_KIND_LABELS[s.kind]} set`;
}

// The technician's view of one vehicle under a pass: a plan of the car with
// each tire's tread profile at its wheel first, the form to record work next,
// history after; the pass strip (time left, "Record work") stays in view. Checked afresh on
// every request; each load is written to the driver's access log.
export default async function PassLogbookPage({ params }: { params: Promise<{ passId: string; vehicleId: string }> }) {
  const { passId, vehicleId } = await params;
  const session = await getSession();
  const now = new Date();
  const today = todayIso(now);
  const f = await viewerFormat();
  let access, logbook;
  try {
    access = await resolvePassAccess({ session, passId, now });
    // The view shows the newest twelve checks and the recent work: load only those.
    logbook = await getVehicleLogbook({ access, vehicleId, today, action: "read_logbook", historyLimit: 12 });
  } catch (err) {
    if (err instanceof AppError && err.code === "pass_ended") return <PassClosed message={err.message} />;
    if (err instanceof AppError && err.code === "not_found") notFound();
    throw err;
  }
  const v = logbook.vehicle;
  const depthUnit = depthUnitFor(logbook.viewer.units);
  const mounted = logbook.sets.filter((s) => s.state === "mounted");
  const others = logbook.sets.filter((s) => s.state !== "mounted");
  const canAdd = access.scope === "view_add";
  const onCar = mounted[0] ?? null;
  // What this pass recorded can be changed or deleted while the pass lets the shop add.
  const controls = { passId, vehicle: { id: v.id, nickname: v.nickname, odometerUnit: v.odometerUnit }, sets: logbook.sets, depthUnit, pressureUnit: logbook.viewer.pressureUnit };

  return (
    <div className="pb-24">
      <header className="mb-5">
        <p className="text-sm font-semibold uppercase tracking-wide text-groove-800">Under a pass · {SCOPE_LABEL[access.scope]}</p>
        <h1 className="text-3xl font-bold tracking-tight">{v.nickname}</h1>
        <p className="text-lg text-asphalt-700">
          {[v.year, v.make, v.model].filter(Boolean).join(" ")}
          {v.plate ? ` · ${v.plate}` : ""}
          {logbook.lastOdometer ? ` · ${f.distance(logbook.lastOdometer.odometerKm, v.odometerUnit)} on ${f.date(logbook.lastOdometer.date)}` : ""}
        </p>
        <Link href={`/shop/passes/${passId}/${vehicleId}/print`} className="mt-1 inline-block font-semibold text-groove-800 underline underline-offset-2">
          Printable tire history
        </Link>
      </header>

      <section aria-labelledby="on-car" className="space-y-3">
        <h2 id="on-car" className="text-xl font-bold">
          On the car{onCar ? `: ${setTitle(onCar)} · ${onCar.size}` : ""}
        </h2>
        {onCar ? (
          <VehiclePlan tires={onCar.tires} limitMm={onCar.limit.minMm} depthUnit={depthUnit} measurable={canAdd} f={f} />
        ) : (
          <p className="text-asphalt-600">The logbook has no set on the car.</p>
        )}
        {onCar?.axleAdvice.length ? <p className="text-asphalt-700">{onCar.axleAdvice.join(" ")}</p> : null}
        <SafetyNote compact />
      </section>

      {canAdd ? (
        <Card className="mt-6 scroll-mt-28" id="record-work">
          <ShopServiceForm
            ctx={{
              passId,
              vehicleId,
              set: onCar ? { id: onCar.id, label: setTitle(onCar).toLowerCase(), tires: onCar.tires.map((t) => ({ id: t.id, position: t.position })) } : null,
              depthUnit,
              pressureUnit: logbook.viewer.pressureUnit,
              odometerUnit: v.odometerUnit,
              today,
            }}
          />
        </Card>
      ) : (
        <p className="mt-6 rounded border border-asphalt-200 bg-asphalt-50 p-3 text-asphalt-700">This pass lets the shop read the logbook. Ask the driver for a “read and add” pass to record work.</p>
      )}

      {canAdd ? (
        <details className="mt-4 rounded-lg border border-asphalt-200 bg-white p-4 shadow-card">
          <summary className="min-h-11 cursor-pointer text-lg font-bold">Log a set the shop fitted</summary>
          <div className="mt-4">
            <ShopFittedSetForm passId={passId} vehicleId={vehicleId} today={today} hasMountedSet={!!onCar} depthUnit={depthUnit} odometerUnit={v.odometerUnit} />
          </div>
        </details>
      ) : null}

      {others.length > 0 ? (
        <section aria-labelledby="other-sets" className="mt-8 space-y-2">
          <h2 id="other-sets" className="text-xl font-bold">
            Other sets
          </h2>
          {others.map((s) => (
            <Card key={s.id} className="space-y-1 p-4">
              <div className="flex flex-wrap items-center justify-between gap-2">
                <p className="font-bold">
                  {setTitle(s)} · {s.size} · {s.state === "stored" ? `stored${s.storageLocation ? ` at ${s.storageLocation}` : ""}` : "retired"}
                </p>
                {s.condition ? <ConditionBadge condition={s.condition} /> : null}
              </div>
              <p className="text-sm text-asphalt-700">
                {s.tires.map((t) => `${POSITION_LABELS[t.position]}: ${t.dotCode ?? "—"}${t.age ? ` (${f.age(t.age)})` : ""}`).join(" · ")}
              </p>
            </Card>
          ))}
        </section>
      ) : null}

      <section aria-labelledby="history" className="mt-8 grid gap-6 lg:grid-cols-2">
        <div>
          <h2 id="history" className="mb-2 text-xl font-bold">
            Work history
          </h2>
          {logbook.service.length === 0 ? <p className="text-asphalt-600">No work recorded.</p> : null}
          <ul className="divide-y divide-asphalt-100 rounded-lg border border-asphalt-200 bg-white">
            {logbook.service.map((s) => (
              <li key={s.id} className="px-4 py-3">
                <p className="font-semibold">
                  {SERVICE_KIND_LABELS[s.kind]} · {f.date(s.performedOn)}
                  {s.odometerKm != null ? ` · ${f.distance(s.odometerKm, v.odometerUnit)}` : ""}
                </p>
                <p className="text-sm text-asphalt-600">{s.shopName ? `${s.shopName}${s.authorName ? `, ${s.authorName}` : ""}` : "Logged by the driver"}</p>
                {s.notes ? <p className="text-sm text-asphalt-700">{s.notes}</p> : null}
                {canAdd && s.byThisPass ? <PassEntryControls {...controls} entry={s} /> : null}
              </li>
            ))}
          </ul>
        </div>
        <div>
          <h2 className="mb-2 text-xl font-bold">Tread checks</h2>
          {logbook.checks.length === 0 ? <p className="text-asphalt-600">No checks recorded.</p> : null}
          <ul className="divide-y divide-asphalt-100 rounded-lg border border-asphalt-200 bg-white">
            {logbook.checks.slice(0, 12).map((c) => (
              <li key={c.id} className="px-4 py-3">
                <p className="font-semibold">
                  {f.date(c.checkedOn)} · {f.count(c.readings.length, { one: "tire", other: "tires" })} · {c.method === "coin" ? "coin (approximate)" : "gauge"}
                </p>
                <p className="text-sm text-asphalt-600">{c.measuredBy === "shop" ? `${c.shopName ?? "A shop"}${c.authorName ? `, ${c.authorName}` : ""}` : "Measured by the driver"}</p>
                {canAdd && c.byThisPass ? <PassEntryControls {...controls} check={c} /> : null}
              </li>
            ))}
          </ul>
        </div>
      </section>

      {logbook.attachments.length > 0 ? (
        <section aria-labelledby="files" className="mt-8">
          <h2 id="files" className="mb-2 text-xl font-bold">
            Receipts and photos
          </h2>
          <ul className="flex flex-wrap gap-2">
            {logbook.attachments.map((a) => (
              <li key={a.id}>
                <a href={`/api/passes/${passId}/attachments/${a.id}`} className="inline-flex min-h-11 items-center gap-2 rounded border border-asphalt-300 bg-white px-3 font-semibold" target="_blank" rel="noreferrer">
                  <Paperclip aria-hidden className="size-4" />
                  {a.fileName}
                </a>
              </li>
            ))}
          </ul>
        </section>
      ) : null}

      {/* The pass strip: time left always in view, and the record-work form one tap away. */}
      <div className="fixed inset-x-0 bottom-0 z-40 border-t-4 border-groove-500 bg-asphalt-900 text-white print:hidden" role="region" aria-label="Pass">
        <div className="mx-auto flex max-w-6xl items-center justify-between gap-3 px-4 py-2">
          <div className="min-w-0">
            <TimeLeft endsAt={access.endsAt.toISOString()} serverNow={now.toISOString()} refreshOnEnd={false} onDark className="text-base sm:text-lg" />
            <p className="truncate text-xs text-asphalt-300 sm:text-sm">
              <span className="hidden sm:inline">{v.nickname} · </span>
              {SCOPE_LABEL[access.scope]}
              <span className="hidden md:inline"> · {access.shopName}</span>
            </p>
          </div>
          {canAdd ? (
            <a href="#record-work" className="inline-flex min-h-12 shrink-0 items-center gap-2 rounded bg-groove-500 px-4 text-base font-bold text-asphalt-950 no-underline hover:bg-groove-400">
              <PencilLine aria-hidden className="size-5" />
              Record work
            </a>
          ) : null}
        </div>
      </div>
    </div>
  );
}
