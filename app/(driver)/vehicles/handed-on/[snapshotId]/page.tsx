import { notFound, redirect } from "next/navigation";
import { PrintableHistoryView } from "@/components/print/printable-history";
import { LocalTime } from "@/components/household/local-time";
import { Alert } from "@/components/ui/alert";
import { getSnapshot } from "@/db/queries/hand-on";
import { getSession } from "@/lib/auth/session";
import { AppError } from "@/lib/errors";

export const dynamic = "force-dynamic";

// The seller's frozen, read-only copy of a vehicle they handed on.
export default async function HandedOnPage({ params, searchParams }: { params: Promise<{ snapshotId: string }>; searchParams: Promise<{ paper?: string }> }) {
  const session = await getSession();
  const { snapshotId } = await params;
  if (!session) redirect(`/sign-in?next=/vehicles/handed-on/${snapshotId}`);
  const paper = (await searchParams).paper === "letter" ? "letter" : "a4";
  const snap = await getSnapshot({ userId: session.user.id, snapshotId }).catch((err) => {
    if (err instanceof AppError && err.code === "not_found") notFound();
    throw err;
  });
  return (
    <>
      <Alert tone="info" className="no-print mb-4" title="A read-only copy">
        You handed this vehicle on <LocalTime iso={snap.handedOnAt} dateOnly />; this is its tire history as it was that day.
      </Alert>
      <PrintableHistoryView h={snap.history} paper={paper} backHref="/vehicles" paperHref={(p) => `/vehicles/handed-on/${snapshotId}?paper=${p}`} />
    </>
  );
}
