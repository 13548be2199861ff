import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { orNotFound } from "@/components/logbook/or-not-found";
import { SetDetailView } from "@/components/logbook/set-detail";
import { getSetDetail } from "@/db/queries/logbook";
import { ownerAccess } from "@/lib/auth/logbook-access";
import { getSession } from "@/lib/auth/session";
import { todayIso } from "@/lib/validation/logbook";

export const metadata: Metadata = { title: "A tire set" };

export const dynamic = "force-dynamic";

export default async function SetPage({ params, searchParams }: { params: Promise<{ setId: string }>; searchParams: Promise<{ saved?: string }> }) {
  const session = await getSession();
  const { setId } = await params;
  if (!session) redirect(`/sign-in?next=/sets/${setId}`);
  const { saved } = await searchParams;
  const detail = await getSetDetail({ access: ownerAccess(session), setId, today: todayIso() }).catch(orNotFound);
  return <SetDetailView initial={detail} saved={saved} />;
}
