"use client";
// The technician's edit form for an entry this pass recorded, loaded when
// "Change" is pressed (pass-entry-controls.tsx): the driver's own forms
// (components/logbook/edit-entry) with the query client they use, so neither
// they nor TanStack Query are on the technician view's first load.
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { useState } from "react";
import { EditCheck, EditServiceEntry } from "@/components/logbook/edit-entry";
import type { CheckView, ServiceView, SetView } from "@/db/queries/logbook";
import type { DepthUnit, PressureUnit } from "@/lib/units";

export type PassEntryEditProps = {
  url: string;
  vehicle: { id: string; nickname: string; odometerUnit: "km" | "mi" };
  sets: SetView[];
  depthUnit: DepthUnit;
  pressureUnit: PressureUnit;
  onDone: () => void;
} & ({ check: CheckView; entry?: never } | { entry: ServiceView; check?: never });

export function PassEntryEdit({ check, entry, ...common }: PassEntryEditProps) {
  const [client] = useState(() => new QueryClient());
  return (
    <QueryClientProvider client={client}>
      {check ? <EditCheck check={check} {...common} /> : <EditServiceEntry entry={entry!} {...common} />}
    </QueryClientProvider>
  );
}
