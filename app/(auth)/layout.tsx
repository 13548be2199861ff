import type { ReactNode } from "react";
import { Brand } from "@/components/shell/brand";

export default function AuthLayout({ children }: { children: ReactNode }) {
  return (
    <div className="flex min-h-dvh flex-col items-center bg-gradient-to-b from-groove-50 to-asphalt-50 px-4 py-10">
      <div className="w-full max-w-sm">
        <header className="mb-8 flex justify-center">
          <Brand />
        </header>
        <main className="rounded-xl border border-asphalt-200 bg-white p-6 shadow-card">{children}</main>
      </div>
    </div>
  );
}
