"use client";
// The vehicle page's corner for what the driver owns: co-keepers, printing
// the tire history, and handing the vehicle on. Kept apart from the logbook
// view so the two can change independently. The co-keepers and the hand-on
// link come from the server after the page is shown, with their code
// (vehicle-keepers.tsx): nothing of them is in the page's first load.
import { FileDown, Printer } from "lucide-react";
import dynamic from "next/dynamic";
import Link from "next/link";
import { buttonVariants } from "@/components/ui/button-variants";

const HandOnLink = dynamic(() => import("./vehicle-keepers").then((m) => m.HandOnLink), { ssr: false });
const KeepersPanel = dynamic(() => import("./vehicle-keepers").then((m) => m.KeepersPanel), { ssr: false });

export function VehicleSharing({ vehicleId, nickname }: { vehicleId: string; nickname: string }) {
  return (
    <section aria-labelledby="owned-h" className="mb-8 space-y-3">
      <h2 id="owned-h" className="text-xl font-bold">
        Keeping and handing on
      </h2>
      <div className="flex flex-wrap gap-2">
        <Link href={`/vehicles/${vehicleId}/print`} className={buttonVariants({ variant: "secondary" })}>
          <Printer aria-hidden className="size-4" />
          Printable tire history
        </Link>
        <a href={`/api/vehicles/${vehicleId}/history-pdf`} download className={buttonVariants({ variant: "secondary" })}>
          <FileDown aria-hidden className="size-4" />
          PDF of the tire history
        </a>
        <HandOnLink vehicleId={vehicleId} />
      </div>
      <KeepersPanel vehicleId={vehicleId} nickname={nickname} />
    </section>
  );
}
