import Link from "next/link";
import type { ReactNode } from "react";
import { Brand } from "@/components/shell/brand";
import { buttonVariants } from "@/components/ui/button-variants";

export default function MarketingLayout({ children }: { children: ReactNode }) {
  return (
    <div className="min-h-dvh">
      <header className="border-b border-asphalt-200 bg-white">
        <div className="mx-auto flex max-w-6xl items-center justify-between gap-2 px-4 py-3">
          <Brand />
          <nav aria-label="Site" className="flex items-center gap-0.5 whitespace-nowrap sm:gap-3">
            <Link href="/pricing" className="px-1.5 text-sm font-semibold text-asphalt-700 sm:px-2">Pricing</Link>
            <Link href="/sign-in" className="px-1.5 text-sm font-semibold text-asphalt-700 sm:px-2">Sign in</Link>
            <Link href="/sign-up" className={buttonVariants({ size: "sm" })}>Start free</Link>
          </nav>
        </div>
      </header>
      <main id="main">{children}</main>
      <footer className="border-t border-asphalt-200 bg-white">
        <div className="mx-auto max-w-6xl px-4 py-6 text-sm text-asphalt-600">
          Fourpatch is a logbook, not an inspection. Its dates and conditions are guidance; local law and a qualified
          tire technician decide whether a tire is fit for the road.
        </div>
      </footer>
    </div>
  );
}
