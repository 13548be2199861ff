import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { DeleteVehicle } from "@/components/logbook/delete-vehicle";
import { orNotFound } from "@/components/logbook/or-not-found";
import { VehicleForm } from "@/components/logbook/vehicle-form";
import { PageHeader } from "@/components/ui/page-header";
import { getVehicleLogbook } from "@/db/queries/logbook";
import { ownerAccess } from "@/lib/auth/logbook-access";
import { getSession } from "@/lib/auth/session";
import { todayIso } from "@/lib/validation/logbook";

export const dynamic = "force-dynamic";
export const metadata: Metadata = { title: "Change a vehicle" };

export default async function EditVehiclePage({ params }: { params: Promise<{ vehicleId: string }> }) {
  const session = await getSession();
  const { vehicleId } = await params;
  if (!session) redirect(`/sign-in?next=/vehicles/${vehicleId}/edit`);
  const book = await getVehicleLogbook({ access: ownerAccess(session), vehicleId, today: todayIso() }).catch(orNotFound);
  const v = book.vehicle;
  const str = (x: string | number | null) => (x == null ? "" : String(x));
  return (
    <div className="mx-auto max-w-3xl space-y-8">
      <PageHeader title={`Change ${v.nickname}`} description="The name, plate, placard sizes and pressures. The sets and history stay as they are." />
      <VehicleForm
        pressureUnit="kpa"
        odometerUnit={v.odometerUnit}
        existing={{
          id: v.id,
          values: {
            nickname: v.nickname,
            make: v.make,
            model: v.model,
            year: str(v.year),
            vin: str(v.vin),
            plate: str(v.plate),
            placardFrontSize: str(v.placardFrontSize),
            placardRearSize: str(v.placardRearSize),
            placardFrontPressure: v.placardFrontKpa != null ? String(Math.round(v.placardFrontKpa)) : "",
            placardRearPressure: v.placardRearKpa != null ? String(Math.round(v.placardRearKpa)) : "",
          },
        }}
      />
      <DeleteVehicle vehicleId={v.id} nickname={v.nickname} sets={book.sets.length} entries={book.checks.length + book.service.length} files={book.attachments.length} />
    </div>
  );
}
