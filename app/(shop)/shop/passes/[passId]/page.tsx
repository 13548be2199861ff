import type { Metadata } from "next";
import Link from "next/link";
import { notFound, redirect } from "next/navigation";
import { PassClosed } from "@/components/passes/pass-closed";
import { TimeLeft } from "@/components/passes/time-left";
import { PageHeader } from "@/components/ui/page-header";
import { listShopPasses, resolvePassAccess } from "@/db/queries/passes";
import { getSession } from "@/lib/auth/session";
import { AppError } from "@/lib/errors";

export const metadata: Metadata = { title: "A shop pass" };

export const dynamic = "force-dynamic";

// A pass for one vehicle opens that vehicle's logbook straight away; a pass
// for several asks which one is in the bay.
export default async function PassPage({ params }: { params: Promise<{ passId: string }> }) {
  const { passId } = await params;
  const session = await getSession();
  const now = new Date();
  let access;
  try {
    access = await resolvePassAccess({ session, passId, now });
  } catch (err) {
    if (err instanceof AppError && err.code === "pass_ended") return <PassClosed message={err.message} />;
    if (err instanceof AppError && err.code === "not_found") notFound();
    throw err;
  }
  if (access.vehicleIds.length === 1) redirect(`/shop/passes/${passId}/${access.vehicleIds[0]}`);
  const row = (await listShopPasses({ session, now })).find((p) => p.id === passId);
  return (
    <>
      <PageHeader title={`Pass from ${row?.driverName ?? "a driver"}`} description={<TimeLeft endsAt={access.endsAt.toISOString()} serverNow={now.toISOString()} />} />
      <ul className="grid gap-3 sm:grid-cols-2">
        {(row?.vehicles ?? []).map((v) => (
          <li key={v.id}>
            <Link href={`/shop/passes/${passId}/${v.id}`} className="block rounded-lg border-2 border-asphalt-200 bg-white p-5 text-xl font-bold no-underline shadow-card hover:border-groove-600">
              {v.nickname}
              <span className="block text-base font-normal text-asphalt-600">{[v.year, v.make, v.model].filter(Boolean).join(" ")}</span>
            </Link>
          </li>
        ))}
      </ul>
    </>
  );
}
