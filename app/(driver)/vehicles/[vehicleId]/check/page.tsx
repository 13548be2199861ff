import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { orNotFound } from "@/components/logbook/or-not-found";
import { CheckForm } from "@/components/logbook/check-form";
import { PageHeader } from "@/components/ui/page-header";
import { getVehicleLogbook } from "@/db/queries/logbook";
import { ownerAccess } from "@/lib/auth/logbook-access";
import { getSession } from "@/lib/auth/session";
import { depthUnitFor } from "@/lib/units";
import { todayIso } from "@/lib/validation/logbook";

export const metadata: Metadata = { title: "Record a tread check" };

export const dynamic = "force-dynamic";

export default async function CheckPage({ params, searchParams }: { params: Promise<{ vehicleId: string }>; searchParams: Promise<{ set?: string }> }) {
  const session = await getSession();
  const { vehicleId } = await params;
  if (!session) redirect(`/sign-in?next=/vehicles/${vehicleId}/check`);
  const { set } = await searchParams;
  const book = await getVehicleLogbook({ access: ownerAccess(session), vehicleId, today: todayIso() }).catch(orNotFound);
  const sets = book.sets
    .filter((s) => s.state !== "retired")
    .map((s) => ({ id: s.id, label: s.label, kind: s.kind, size: s.size, state: s.state, tires: s.tires.map((t) => ({ id: t.id, position: t.position })) }));
  return (
    <div className="mx-auto max-w-3xl">
      <PageHeader title={`Tread check — ${book.vehicle.nickname}`} description="Measure each tire in its inner, centre and outer grooves; the lowest counts." />
      <CheckForm
        vehicle={{ id: book.vehicle.id, nickname: book.vehicle.nickname, odometerUnit: book.vehicle.odometerUnit }}
        sets={sets}
        lastOdometer={book.lastOdometer}
        depthUnit={depthUnitFor(book.viewer.units)}
        pressureUnit={book.viewer.pressureUnit}
        preselect={set}
      />
    </div>
  );
}
