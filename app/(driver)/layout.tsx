import { redirect } from "next/navigation";
import type { ReactNode } from "react";
import { AppShell } from "@/components/shell/app-shell";
import { getSession } from "@/lib/auth/session";

// Every account keeps its own vehicles: drivers, shop staff and operators alike keep
// their own tires here. Only signed-out visitors are turned away.
export default async function DriverLayout({ children }: { children: ReactNode }) {
  const session = await getSession();
  if (!session) redirect("/sign-in?next=/vehicles");
  return (
    <AppShell
      areaLabel="Vehicles"
      homeHref="/vehicles"
      userName={session.user.name}
      nav={[
        { href: "/vehicles", label: "Vehicles", exact: true },
        { href: "/log-purchase", label: "Log a purchase" },
        { href: "/passes", label: "Shop passes" },
        { href: "/reminders", label: "Reminders" },
        { href: "/account", label: "Account" },
      ]}
    >
      {children}
    </AppShell>
  );
}
