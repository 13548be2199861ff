import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { PurchaseForm } from "@/components/logbook/purchase-form";
import { PageHeader } from "@/components/ui/page-header";
import { driverPrefs, listVehicleChoices } from "@/db/queries/logbook";
import { getSession } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Log a purchase" };

export const dynamic = "force-dynamic";

export default async function LogPurchasePage({ searchParams }: { searchParams: Promise<{ vehicle?: string }> }) {
  const session = await getSession();
  if (!session) redirect("/sign-in?next=/log-purchase");
  const [vehicles, prefs, { vehicle }] = await Promise.all([listVehicleChoices({ userId: session.user.id }), driverPrefs({ userId: session.user.id }), searchParams]);
  return (
    <div className="mx-auto max-w-3xl">
      <PageHeader title="Log a tire purchase" description="The set, each tire's DOT code and the receipt, saved together." />
      <PurchaseForm vehicles={vehicles} units={prefs.units} preselect={vehicle} />
    </div>
  );
}
