import type { Metadata } from "next";
import { CalendarClock, Gauge, Plus, Warehouse } from "lucide-react";
import Link from "next/link";
import { redirect } from "next/navigation";
import { linkClass, setTitle } from "@/components/logbook/format";
import { viewerFormat } from "@/lib/format/server";
import { buttonVariants } from "@/components/ui/button-variants";
import { Card } from "@/components/ui/card";
import { ConditionBadge } from "@/components/ui/condition-badge";
import { PageHeader } from "@/components/ui/page-header";
import { SafetyNote } from "@/components/ui/safety-note";
import { listVehicleSummaries } from "@/db/queries/logbook";
import { getSession } from "@/lib/auth/session";
import { depthUnitFor, distanceUnitFor } from "@/lib/units";
import { SetAtAGlance } from "@/components/visual/set-at-a-glance";
import { HandedOnList } from "@/components/household/handed-on-list";
import { todayIso } from "@/lib/validation/logbook";

export const metadata: Metadata = { title: "Vehicles" };

export const dynamic = "force-dynamic";

export default async function VehiclesOverviewPage() {
  const f = await viewerFormat();
  const session = await getSession();
  if (!session) redirect("/sign-in?next=/vehicles");
  const { vehicles, prefs } = await listVehicleSummaries({ userId: session.user.id, today: todayIso() });
  const unit = distanceUnitFor(prefs.units);
  const depthUnit = depthUnitFor(prefs.units);
  return (
    <>
      <PageHeader
        title={`${session.user.name.split(" ")[0] ?? "Your"}'s vehicles`}
        description="Your vehicles, the tires on them and the ones in storage."
        actions={
          <>
            <Link href="/log-purchase" className={buttonVariants()}>
              Log a tire purchase
            </Link>
            <Link href="/vehicles/new" className={buttonVariants({ variant: "secondary" })}>
              <Plus aria-hidden className="size-4" /> Add a vehicle
            </Link>
          </>
        }
      />
      {vehicles.length === 0 ? (
        <Card className="mb-6">
          <p className="text-asphalt-700">No vehicles yet. Add one, or add it while you log your first set of tires.</p>
        </Card>
      ) : (
        <ul className="mb-6 grid gap-4 md:grid-cols-2">
          {vehicles.map((v) => (
            <li key={v.id}>
              <Card className="h-full space-y-3">
                <div className="flex items-start justify-between gap-2">
                  <div>
                    <h2 className="text-lg font-bold">
                      <Link href={`/vehicles/${v.id}`} className="text-asphalt-950 underline-offset-4 hover:underline">
                        {v.nickname}
                      </Link>
                    </h2>
                    <p className="text-sm text-asphalt-600">
                      {v.make} {v.model}
                      {v.year ? ` · ${v.year}` : ""}
                    </p>
                    {v.keptWith ? <p className="text-sm font-semibold text-groove-800">Kept with {v.keptWith}</p> : null}
                  </div>
                  {v.mountedSet?.condition ? <ConditionBadge condition={v.mountedSet.condition} /> : null}
                </div>
                {v.mountedSet ? <SetAtAGlance tires={v.mountedSet.tires} limitMm={v.mountedSet.limitMm} depthUnit={depthUnit} /> : null}
                <dl className="space-y-2 text-sm">
                  <div className="flex gap-2">
                    <Gauge aria-hidden className="mt-0.5 size-4 shrink-0 text-asphalt-500" />
                    {/* The term is shown once, visibly: no second, hidden copy for screen readers. */}
                    <dt className="shrink-0 text-asphalt-600">On the car:</dt>
                    <dd>
                      {v.mountedSet ? (
                        <>
                          <Link href={`/sets/${v.mountedSet.id}`} className={linkClass}>{setTitle(v.mountedSet)}</Link> ({v.mountedSet.size})
                        </>
                      ) : (
                        <>no set in the logbook.</>
                      )}
                    </dd>
                  </div>
                  <div className="flex gap-2">
                    <CalendarClock aria-hidden className="mt-0.5 size-4 shrink-0 text-asphalt-500" />
                    <dt className="shrink-0 text-asphalt-600">Next:</dt>
                    <dd>
                      {v.nextReminder ? (
                        <>
                          <strong>{f.date(v.nextReminder.date)}</strong> — {v.nextReminder.subject}
                          {v.nextReminder.overdue ? <span className="font-semibold text-condition-replace"> (overdue)</span> : null}
                        </>
                      ) : (
                        "no reminder yet: log the tires' DOT codes and a tread check."
                      )}
                    </dd>
                  </div>
                  <div className="flex gap-2">
                    <Gauge aria-hidden className="mt-0.5 size-4 shrink-0 text-asphalt-500" />
                    <dt className="shrink-0 text-asphalt-600">Last check:</dt>
                    <dd>
                      {v.lastCheck ? (
                        <>
                          {f.date(v.lastCheck.date)}
                          {v.lastCheck.odometerKm != null ? ` at ${f.distance(v.lastCheck.odometerKm, unit)}` : ""}
                        </>
                      ) : (
                        "none yet."
                      )}
                    </dd>
                  </div>
                  {v.storedSets.map((s) => (
                    <div key={s.id} className="flex gap-2">
                      <dt className="sr-only">Stored</dt>
                      <Warehouse aria-hidden className="mt-0.5 size-4 shrink-0 text-asphalt-500" />
                      <dd className="flex flex-wrap items-center gap-2">
                        <span>
                          Stored: <Link href={`/sets/${s.id}`} className={linkClass}>{setTitle(s)}</Link>
                          {s.storageLocation ? ` at ${s.storageLocation}` : ""}
                        </span>
                        {s.condition ? <ConditionBadge condition={s.condition} className="text-xs" /> : null}
                      </dd>
                    </div>
                  ))}
                </dl>
                <div className="flex flex-wrap gap-2 pt-1">
                  <Link href={`/vehicles/${v.id}/check`} className={buttonVariants({ variant: "secondary", size: "sm" })}>
                    Record a tread check
                  </Link>
                  <Link href={`/vehicles/${v.id}`} className={buttonVariants({ variant: "ghost", size: "sm" })}>
                    Open the logbook
                  </Link>
                </div>
              </Card>
            </li>
          ))}
        </ul>
      )}
      <SafetyNote />
      <HandedOnList userId={session.user.id} />
    </>
  );
}
