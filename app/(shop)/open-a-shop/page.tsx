import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { CreateShopForm } from "@/components/shops/shop-profile-form";
import { AppShell } from "@/components/shell/app-shell";
import { Card } from "@/components/ui/card";
import { PageHeader } from "@/components/ui/page-header";
import { getSession } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Open a shop" };

export const dynamic = "force-dynamic";

// Outside the shop workspace's guard: the person opening a shop is not a member of one yet.
export default async function OpenShopPage() {
  const session = await getSession();
  if (!session) redirect("/sign-in?next=/open-a-shop");
  return (
    <AppShell
      areaLabel="New shop"
      homeHref="/vehicles"
      userName={session.user.name}
      nav={[
        { href: "/vehicles", label: "Vehicles", exact: true },
        { href: "/open-a-shop", label: "Open a shop" },
      ]}
    >
      <PageHeader
        title="Open a shop account"
        description="Drivers find the shop in the directory and give it passes to their logbooks. You become the shop's owner and can invite technicians."
      />
      <Card className="max-w-2xl">
        <CreateShopForm />
      </Card>
    </AppShell>
  );
}
