"use client";
// The viewer's locale and time zone for client components. The server reads
// them from the request (lib/format/server.ts) and hands them down, so the
// server's HTML and the browser's first render show the same text.
import { useRouter } from "next/navigation";
import { useEffect, useMemo, type ReactNode } from "react";
import { formatter, TIME_ZONE_COOKIE, type FormatPrefs } from "@/lib/format";
import { FormatContext as Ctx, useFormat } from "./format-context";

export function FormatProvider({ prefs, children }: { prefs: FormatPrefs; children: ReactNode }) {
  const value = useMemo(() => formatter(prefs), [prefs]);
  return (
    <Ctx.Provider value={value}>
      <TimeZoneCookie serverZone={prefs.timeZone} />
      {children}
    </Ctx.Provider>
  );
}

export { useFormat };

/**
 * The browser knows its own zone; the server learns it from this cookie. On a
 * first visit (or after travelling) the page is drawn again once, in the
 * right zone.
 */
function TimeZoneCookie({ serverZone }: { serverZone: string }) {
  const router = useRouter();
  useEffect(() => {
    let zone: string | undefined;
    try {
      zone = Intl.DateTimeFormat().resolvedOptions().timeZone;
    } catch {
      return;
    }
    if (!zone || zone === serverZone) return;
    document.cookie = `${TIME_ZONE_COOKIE}=${encodeURIComponent(zone)}; path=/; max-age=31536000; samesite=lax`;
    router.refresh();
  }, [serverZone, router]);
  return null;
}
