import { PageHeader } from "@/components/ui/page-header";
import { membershipsOf } from "@/lib/auth/roles";
import { getSession } from "@/lib/auth/session";

export const dynamic = "force-dynamic";

export default async function ShopHomePage() {
  const session = await getSession();
  const shops = session ? await membershipsOf({ userId: session.user.id }) : [];
  return (
    <>
      <PageHeader
        title={`Passes at ${shops[0]?.shopName ?? "your shop"}`}
        description="Logbooks that drivers have shared with the shop, for as long as each pass lasts."
      />
      <p className="text-asphalt-600">No driver has shared a logbook with the shop yet.</p>
    </>
  );
}
