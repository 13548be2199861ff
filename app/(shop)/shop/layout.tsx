import { redirect } from "next/navigation";
import type { ReactNode } from "react";
import { AppShell } from "@/components/shell/app-shell";
import { NotForThisAccount } from "@/components/shell/not-for-this-account";
import { membershipsOf } from "@/lib/auth/roles";
import { getSession } from "@/lib/auth/session";
import { formerShopsOf } from "@/db/queries/shops";

export default async function ShopLayout({ children }: { children: ReactNode }) {
  const session = await getSession();
  if (!session) redirect("/sign-in?next=/shop");
  const shops = await membershipsOf({ userId: session.user.id });
  if (shops.length === 0) {
    const former = await formerShopsOf({ userId: session.user.id, email: session.user.email });
    if (former.length > 0) {
      return (
        <NotForThisAccount
          area="shop workspace"
          home="/vehicles"
          title="You are no longer on the staff"
          message={`${former.join(" and ")} removed this account from its staff, so its passes are closed to you. Your own vehicles are still yours. If this is a mistake, ask the shop's owner for a new invitation.`}
        />
      );
    }
    return <NotForThisAccount area="shop workspace" home="/vehicles" />;
  }
  const owner = shops.some((s) => s.role === "owner");
  return (
    <AppShell
      areaLabel={shops[0].shopName}
      homeHref="/shop"
      userName={session.user.name}
      nav={[
        { href: "/shop", label: "Passes", exact: true },
        ...(owner ? [{ href: "/shop/profile", label: "Shop & staff" }] : []),
        { href: "/vehicles", label: "My own vehicles" },
      ]}
    >
      {children}
    </AppShell>
  );
}
