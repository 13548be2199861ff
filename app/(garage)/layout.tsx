import { redirect } from "next/navigation";
import type { ReactNode } from "react";
import { AppShell } from "@/components/shell/app-shell";
import { getSession } from "@/lib/auth/session";
import { GarageProviders } from "./providers";

// Every account owns a garage: drivers, shop staff and operators alike keep
// their own tires here. Only signed-out visitors are turned away.
export default async function GarageLayout({ children }: { children: ReactNode }) {
  const session = await getSession();
  if (!session) redirect("/sign-in?next=/garage");
  return (
    <AppShell
      areaLabel="Garage"
      homeHref="/garage"
      userName={session.user.name}
      nav={[
        { href: "/garage", label: "Garage", exact: true },
        { href: "/garage/log-purchase", label: "Log a purchase" },
        { href: "/garage/passes", label: "Shop passes" },
        { href: "/garage/reminders", label: "Reminders" },
        { href: "/garage/account", label: "Account" },
      ]}
    >
      <GarageProviders>{children}</GarageProviders>
    </AppShell>
  );
}
