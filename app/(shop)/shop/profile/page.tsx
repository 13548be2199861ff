import type { Metadata } from "next";
import { EditShopForm } from "@/components/shops/shop-profile-form";
import { StaffManager } from "@/components/shops/staff-manager";
import { Alert } from "@/components/ui/alert";
import { Card, CardTitle } from "@/components/ui/card";
import { PageHeader } from "@/components/ui/page-header";
import { NotForThisAccount } from "@/components/shell/not-for-this-account";
import { getShopForOwner } from "@/db/queries/shops";
import { membershipsOf, requireSession } from "@/lib/auth/roles";
import { getSession } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Shop and staff" };

export const dynamic = "force-dynamic";

export default async function ShopProfilePage() {
  const session = requireSession(await getSession());
  const shops = await membershipsOf({ userId: session.user.id });
  // Next runs this page beside the layout's check: refuse here too (the layout shows the same).
  if (shops.length === 0) return <NotForThisAccount area="shop workspace" home="/vehicles" />;
  const owned = shops.find((s) => s.role === "owner");
  if (!owned) {
    return (
      <>
        <PageHeader title="Shop & staff" />
        <Alert tone="info">Only the shop&apos;s owner can change its profile and staff. Ask {shops[0]?.shopName ?? "the shop"}&apos;s owner.</Alert>
      </>
    );
  }
  const { profile, staff, invitations } = await getShopForOwner({ session, shopId: owned.shopId, now: new Date() });
  return (
    <>
      <PageHeader title={`${profile.name}: profile and staff`} description="Drivers see the profile in the directory when they choose a shop for a pass." />
      <div className="grid gap-6 lg:grid-cols-2">
        <Card>
          <CardTitle className="mb-4">Profile</CardTitle>
          <EditShopForm
            shopId={owned.shopId}
            defaults={{
              name: profile.name,
              town: profile.town ?? "",
              address: profile.address ?? "",
              phone: profile.phone ?? "",
              email: profile.email ?? "",
              about: profile.about ?? "",
            }}
          />
        </Card>
        <Card>
          <CardTitle className="mb-4">Staff</CardTitle>
          <StaffManager
            shopId={owned.shopId}
            staff={staff}
            invitations={invitations.map((i) => ({ id: i.id, email: i.email, expired: i.expired, expiresAt: i.expiresAt.toISOString() }))}
          />
        </Card>
      </div>
    </>
  );
}
