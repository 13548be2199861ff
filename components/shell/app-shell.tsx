import type { ReactNode } from "react";
import { Brand } from "./brand";
import { NavLinks, type NavItem } from "./nav-links";
import { SignOutButton } from "./sign-out-button";

export type { NavItem };

/** The frame of every signed-in page: brand, the area's links, the account. */
export function AppShell({
  nav,
  userName,
  areaLabel,
  homeHref,
  children,
}: {
  nav: NavItem[];
  userName: string;
  areaLabel: string;
  homeHref: string;
  children: ReactNode;
}) {
  return (
    <div className="min-h-dvh">
      <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:z-50 focus:rounded focus:bg-white focus:p-2">
        Skip to content
      </a>
      <header className="sticky top-0 z-30 border-b border-asphalt-200 bg-white/95 backdrop-blur">
        <div className="mx-auto flex max-w-6xl items-center justify-between gap-3 px-4 py-2">
          <div className="flex items-center gap-3">
            <Brand href={homeHref} />
            <span className="hidden rounded-full bg-groove-50 px-2 py-0.5 text-xs font-semibold text-groove-800 sm:inline">
              {areaLabel}
            </span>
          </div>
          <div className="flex items-center gap-2">
            <span className="hidden text-sm text-asphalt-600 md:inline">{userName}</span>
            <SignOutButton />
          </div>
        </div>
        <NavLinks items={nav} />
      </header>
      <main id="main" className="mx-auto max-w-6xl px-4 py-6 sm:py-8">
        {children}
      </main>
    </div>
  );
}
