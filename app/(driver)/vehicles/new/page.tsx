import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { VehicleForm } from "@/components/logbook/vehicle-form";
import { PageHeader } from "@/components/ui/page-header";
import { driverPrefs } from "@/db/queries/logbook";
import { getSession } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Add a vehicle" };

export const dynamic = "force-dynamic";

export default async function NewVehiclePage({ searchParams }: { searchParams: Promise<{ then?: string }> }) {
  const session = await getSession();
  if (!session) redirect("/sign-in?next=/vehicles/new");
  const [prefs, { then }] = await Promise.all([driverPrefs({ userId: session.user.id }), searchParams]);
  return (
    <div className="mx-auto max-w-3xl">
      <PageHeader title="Add a vehicle" description="Only a name, the make and the model are needed; the placard size lets Fourpatch check new tires against it." />
      <VehicleForm pressureUnit={prefs.pressureUnit} odometerUnit={prefs.units === "imperial" ? "mi" : "km"} then={then === "log-purchase" ? "log-purchase" : undefined} />
    </div>
  );
}
