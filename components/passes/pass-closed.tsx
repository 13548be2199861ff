import { TimerOff } from "lucide-react";
import Link from "next/link";
import { buttonVariants } from "@/components/ui/button-variants";

/** What the technician sees instead of the logbook once the pass has ended. */
export function PassClosed({ message }: { message: string }) {
  return (
    <div role="alert" className="mx-auto max-w-xl space-y-4 rounded-lg border-2 border-asphalt-300 bg-white p-6 text-center shadow-card">
      <TimerOff aria-hidden className="mx-auto size-10 text-asphalt-500" />
      <h1 className="text-2xl font-bold">The logbook is closed to the shop</h1>
      <p className="text-lg text-asphalt-700">{message}</p>
      <Link href="/shop" className={buttonVariants({ size: "lg" })}>
        Back to the shop&apos;s passes
      </Link>
    </div>
  );
}
