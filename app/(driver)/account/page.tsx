import Link from "next/link";
import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { AccountData } from "@/components/account/account-data";
import { UnitsForm } from "@/components/logbook/units-form";
import { Card, CardTitle } from "@/components/ui/card";
import { PageHeader } from "@/components/ui/page-header";
import { planOf } from "@/db/queries/billing";
import { driverPrefs } from "@/db/queries/logbook";
import { getSession } from "@/lib/auth/session";
import { saveUnits } from "./actions";

export const metadata: Metadata = { title: "Account" };

export const dynamic = "force-dynamic";

export default async function AccountPage() {
  const session = await getSession();
  if (!session) redirect("/sign-in?next=/account");
  const [prefs, plan] = await Promise.all([driverPrefs({ userId: session.user.id }), planOf({ userId: session.user.id })]);
  return (
    <div className="mx-auto max-w-3xl space-y-4">
      <PageHeader title="Account" description={`${session.user.name} · ${session.user.email}`} />
      <Card className="space-y-2">
        <CardTitle>Plan: {plan === "plus" ? "Plus" : "Free"}</CardTitle>
        <p className="text-sm text-asphalt-600">What you pay, when it renews, invoices, and cancelling.</p>
        <Link href="/account/billing" className="font-semibold">
          {plan === "plus" ? "Manage billing" : "Upgrade to Plus"}
        </Link>
      </Card>
      <Card className="space-y-3">
        <CardTitle>Units</CardTitle>
        <p className="text-sm text-asphalt-600">The logbook stores millimetres, kilometres and kPa; this only changes how they are shown and typed.</p>
        <UnitsForm initial={{ units: prefs.units, pressureUnit: prefs.pressureUnit }} save={saveUnits} />
      </Card>
      <AccountData />
    </div>
  );
}
