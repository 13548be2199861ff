import { redirect } from "next/navigation";
import { HandOnForm } from "@/components/household/hand-on-form";
import { orNotFound } from "@/components/logbook/or-not-found";
import { PageHeader } from "@/components/ui/page-header";
import { openHandOnOf } from "@/db/queries/hand-on";
import { getVehicleLogbook } from "@/db/queries/logbook";
import { ownerAccess } from "@/lib/auth/logbook-access";
import { getSession } from "@/lib/auth/session";
import { Alert } from "@/components/ui/alert";
import { todayIso } from "@/lib/validation/logbook";

export const dynamic = "force-dynamic";

export default async function HandOnPage({ params }: { params: Promise<{ vehicleId: string }> }) {
  const session = await getSession();
  const { vehicleId } = await params;
  if (!session) redirect(`/sign-in?next=/vehicles/${vehicleId}/hand-on`);
  const access = ownerAccess(session);
  const book = await getVehicleLogbook({ access, vehicleId, today: todayIso() }).catch(orNotFound);
  if (book.role !== "owner") {
    return (
      <Alert tone="warning" title="Only the owner hands a vehicle on">
        You keep {book.vehicle.nickname}&apos;s logbook as a co-keeper; its owner decides who takes it on.
      </Alert>
    );
  }
  const open = await openHandOnOf({ access, vehicleId });
  return (
    <div className="mx-auto max-w-2xl">
      <PageHeader
        title={`Hand on ${book.vehicle.nickname}`}
        description="Selling it or giving it away? The next owner gets its tire history: sets, date codes, checks and service. Once they accept, the vehicle leaves your list, and its shop passes and co-keepers end."
      />
      <HandOnForm vehicleId={vehicleId} nickname={book.vehicle.nickname} open={open ? { id: open.id, toEmail: open.toEmail, expiresAt: open.expiresAt } : null} />
    </div>
  );
}
