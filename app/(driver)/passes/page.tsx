import type { Metadata } from "next";
import Link from "next/link";
import { viewerFormat } from "@/lib/format/server";
import { AccessLogTable } from "@/components/passes/access-log-table";
import { IssuePassForm } from "@/components/passes/issue-pass-form";
import { PassActions } from "@/components/passes/pass-actions";
import { PassStateBadge } from "@/components/passes/pass-state-badge";
import { TimeLeft } from "@/components/passes/time-left";
import { buttonVariants } from "@/components/ui/button-variants";
import { Card, CardTitle } from "@/components/ui/card";
import { PageHeader } from "@/components/ui/page-header";
import { listAccessLog, listDriverPasses, listPassableVehicles } from "@/db/queries/passes";
import { ownerAccess } from "@/lib/auth/logbook-access";
import { requireSession } from "@/lib/auth/roles";
import { getSession } from "@/lib/auth/session";
import { cn } from "@/lib/cn";
import { SCOPE_LABEL } from "@/lib/validation/passes";

export const metadata: Metadata = { title: "Shop passes" };

export const dynamic = "force-dynamic";

export default async function DriverPassesPage() {
  const f = await viewerFormat();
  const session = requireSession(await getSession());
  const now = new Date();
  const [vehicles, passes, log] = await Promise.all([
    listPassableVehicles({ session }),
    listDriverPasses({ session, now }),
    // The newest 200 rows (reads are one row per visit); the API pages through the rest.
    listAccessLog({ access: ownerAccess(session), limit: 200 }),
  ]);
  const active = passes.filter((p) => p.state === "active" || p.state === "scheduled");
  const ended = passes.filter((p) => p.state !== "active" && p.state !== "scheduled");

  return (
    <>
      <PageHeader
        title="Shop passes"
        description="Let a tire shop open a vehicle's logbook while it works on your car. Each pass ends by itself; you can end it sooner."
      />

      <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_minmax(0,1fr)]">
        <Card>
          <CardTitle className="mb-4">Give a shop a pass</CardTitle>
          {vehicles.length === 0 ? (
            <div className="space-y-3">
              <p className="text-asphalt-700">A pass opens a vehicle&apos;s logbook. Add a vehicle first.</p>
              <Link href="/vehicles/new" className={buttonVariants({ variant: "secondary" })}>
                Add a vehicle
              </Link>
            </div>
          ) : (
            <IssuePassForm vehicles={vehicles} />
          )}
        </Card>

        <section aria-labelledby="active-passes" className="space-y-3">
          <h2 id="active-passes" className="text-lg font-bold">
            Open passes
          </h2>
          {active.length === 0 ? <p className="text-asphalt-600">No shop can open your logbook right now.</p> : null}
          <ul className="space-y-3">
            {active.map((p) => (
              <li key={p.id}>
                <Card className="space-y-3" data-testid="driver-pass">
                  <div className="flex flex-wrap items-center justify-between gap-2">
                    <p className="text-lg font-bold">{p.shopName}</p>
                    <PassStateBadge state={p.state} />
                  </div>
                  <p className="text-asphalt-700">
                    {p.vehicles.map((v) => v.nickname).join(", ")} · {SCOPE_LABEL[p.scope]}
                  </p>
                  <p className="flex flex-wrap items-center gap-x-3 text-sm text-asphalt-700">
                    <TimeLeft endsAt={p.endsAt.toISOString()} serverNow={now.toISOString()} refreshOnEnd />
                    <span>Ends {f.dateTime(p.endsAt)}</span>
                  </p>
                  {p.note ? <p className="text-sm text-asphalt-600">Your note: “{p.note}”</p> : null}
                  <PassActions passId={p.id} shopName={p.shopName} />
                </Card>
              </li>
            ))}
          </ul>
        </section>
      </div>

      <section aria-labelledby="access-log" className="mt-8 space-y-4">
        <h2 id="access-log" className="text-lg font-bold">
          Access log
        </h2>
        <p className="text-sm text-asphalt-600">Every time a shop opened a logbook or added to it under one of your passes.</p>
        {vehicles.map((v) => (
          <Card key={v.id} className="space-y-2">
            <h3 className="font-bold">{v.nickname}</h3>
            <AccessLogTable rows={log.filter((l) => l.vehicleId === v.id)} />
          </Card>
        ))}
      </section>

      {ended.length > 0 ? (
        <section aria-labelledby="ended-passes" className="mt-8 space-y-3">
          <h2 id="ended-passes" className="text-lg font-bold">
            Ended passes
          </h2>
          <ul className="divide-y divide-asphalt-100 rounded-lg border border-asphalt-200 bg-white">
            {ended.map((p) => (
              <li key={p.id} className={cn("flex flex-wrap items-center justify-between gap-2 px-4 py-3 text-asphalt-700")}>
                <span>
                  <span className="font-semibold">{p.shopName}</span> · {p.vehicles.map((v) => v.nickname).join(", ")} · {SCOPE_LABEL[p.scope]}
                </span>
                <span className="flex items-center gap-2 text-sm">
                  <PassStateBadge state={p.state} />
                  {f.dateTime(p.revokedAt && p.revokedAt < p.endsAt ? p.revokedAt : p.endsAt)}
                </span>
              </li>
            ))}
          </ul>
        </section>
      ) : null}

      <p className="mt-8 text-sm text-asphalt-600">
        Run a tire shop?{" "}
        <Link href="/open-a-shop" className="font-semibold text-groove-800">
          Open a shop account
        </Link>{" "}
        to receive passes from your customers.
      </p>
    </>
  );
}
