import { notFound, redirect } from "next/navigation";
import { VehicleLogbookView } from "@/components/logbook/vehicle-logbook";
import { getVehicleLogbook } from "@/db/queries/logbook";
import { ownerAccess } from "@/lib/auth/logbook-access";
import { getSession } from "@/lib/auth/session";
import { AppError } from "@/lib/errors";
import { todayIso } from "@/lib/validation/logbook";

export const dynamic = "force-dynamic";

export default async function VehiclePage({ params, searchParams }: { params: Promise<{ vehicleId: string }>; searchParams: Promise<{ saved?: string }> }) {
  const session = await getSession();
  const { vehicleId } = await params;
  if (!session) redirect(`/sign-in?next=/garage/vehicles/${vehicleId}`);
  const { saved } = await searchParams;
  try {
    const book = await getVehicleLogbook({ access: ownerAccess(session), vehicleId, today: todayIso() });
    return <VehicleLogbookView initial={book} saved={saved} />;
  } catch (e) {
    if (e instanceof AppError && e.code === "not_found") notFound();
    throw e;
  }
}
