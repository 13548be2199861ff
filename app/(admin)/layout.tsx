import { redirect } from "next/navigation";
import type { ReactNode } from "react";
import { AppShell } from "@/components/shell/app-shell";
import { NotForThisAccount } from "@/components/shell/not-for-this-account";
import { isAdmin } from "@/lib/auth/roles";
import { getSession } from "@/lib/auth/session";

export default async function AdminLayout({ children }: { children: ReactNode }) {
  const session = await getSession();
  if (!session) redirect("/sign-in?next=/admin");
  if (!isAdmin(session)) return <NotForThisAccount area="operators' console" home="/start" />;
  return (
    <AppShell
      areaLabel="Operators"
      homeHref="/admin"
      userName={session.user.name}
      nav={[
        { href: "/admin", label: "Accounts", exact: true },
        { href: "/admin/shops", label: "Shops" },
        { href: "/admin/audit", label: "Audit log" },
      ]}
    >
      {children}
    </AppShell>
  );
}
