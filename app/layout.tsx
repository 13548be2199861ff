import type { Metadata, Viewport } from "next";
import localFont from "next/font/local";
import { connection } from "next/server";
import type { ReactNode } from "react";
import { FormatProvider } from "@/components/format/format-provider";
import { LazyToaster } from "@/components/ui/lazy-toaster";
import { viewerPrefs } from "@/lib/format/server";
import "./globals.css";

const sans = localFont({
  src: "./fonts/atkinson-next.woff2",
  variable: "--font-sans",
  weight: "200 800",
  display: "swap",
});
// Only DOT codes and references use it, none of them what a page is read by
// first: not preloaded, so its 40 KiB do not compete with the page's own start.
const mono = localFont({
  src: "./fonts/jetbrains-mono.woff2",
  variable: "--font-mono",
  weight: "100 800",
  display: "swap",
  preload: false,
});

export const metadata: Metadata = {
  title: { default: "Fourpatch — the tire logbook you own", template: "%s · Fourpatch" },
  description:
    "Keep every tire's date code and tread checks, see when each tire reaches its limit, and share a logbook with your shop for just as long as the service takes.",
};

export const viewport: Viewport = { width: "device-width", initialScale: 1, themeColor: "#1e625c" };

// Every page is rendered per request, so each gets the nonce of its own CSP (proxy.ts).
export default async function RootLayout({ children }: { children: ReactNode }) {
  await connection();
  const prefs = await viewerPrefs();
  return (
    <html lang="en" className={`${sans.variable} ${mono.variable}`}>
      <body className="min-h-dvh font-sans">
        <FormatProvider prefs={prefs}>{children}</FormatProvider>
        <LazyToaster />
      </body>
    </html>
  );
}
