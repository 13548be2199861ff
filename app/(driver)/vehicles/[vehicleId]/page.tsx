import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { orNotFound } from "@/components/logbook/or-not-found";
import { VehicleLogbookView } from "@/components/logbook/vehicle-logbook";
import { getVehicleLogbook } from "@/db/queries/logbook";
import { ownerAccess } from "@/lib/auth/logbook-access";
import { getSession } from "@/lib/auth/session";
import { todayIso } from "@/lib/validation/logbook";

export const metadata: Metadata = { title: "A vehicle's logbook" };

export const dynamic = "force-dynamic";

export default async function VehiclePage({ params, searchParams }: { params: Promise<{ vehicleId: string }>; searchParams: Promise<{ saved?: string }> }) {
  const session = await getSession();
  const { vehicleId } = await params;
  if (!session) redirect(`/sign-in?next=/vehicles/${vehicleId}`);
  const { saved } = await searchParams;
  const book = await getVehicleLogbook({ access: ownerAccess(session), vehicleId, today: todayIso() }).catch(orNotFound);
  return <VehicleLogbookView initial={book} saved={saved} />;
}
