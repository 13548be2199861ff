"use client";
import Link from "next/link";
import { usePathname } from "next/navigation";
import { cn } from "@/lib/cn";

export type NavItem = { href: string; label: string; exact?: boolean };

export function NavLinks({ items }: { items: NavItem[] }) {
  const pathname = usePathname();
  return (
    // On a phone every destination gets an equal column and its label may wrap: nothing is cut off or scrolled away.
    <nav aria-label="Main" className="mx-auto max-w-6xl px-1 sm:px-2">
      <ul className="grid auto-cols-fr grid-flow-col sm:flex sm:gap-1 sm:whitespace-nowrap">
        {items.map((item) => {
          const active = item.exact ? pathname === item.href : pathname === item.href || pathname.startsWith(`${item.href}/`);
          return (
            <li key={item.href}>
              <Link
                href={item.href}
                aria-current={active ? "page" : undefined}
                className={cn(
                  "flex min-h-11 items-center justify-center border-b-2 px-1 text-center text-xs leading-tight font-semibold no-underline sm:inline-flex sm:px-3 sm:text-sm",
                  active ? "border-groove-700 text-groove-800" : "border-transparent text-asphalt-600 hover:text-asphalt-900",
                )}
              >
                {item.label}
              </Link>
            </li>
          );
        })}
      </ul>
    </nav>
  );
}
