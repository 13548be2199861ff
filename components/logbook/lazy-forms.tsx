"use client";
// The logbook's forms that open on request (a new service entry, the set's
// settings, changing a saved check or entry, a tire's editor, a seasonal swap) load their code when opened:
// with them come zod, react-hook-form and the schemas, which the page itself
// does not need to be shown. Until a form is opened its button is drawn here,
// the same as the form's own closed state; the code starts loading when the
// pointer or the focus reaches the button, and a short "Opening…" shows while
// it arrives.
import dynamic from "next/dynamic";
import { useState, type ReactNode } from "react";
import { Button } from "@/components/ui/button";
import { FormLoading } from "@/components/ui/form-loading";
import type { SetView } from "@/db/queries/logbook";
import type { TireView } from "@/db/queries/logbook-view";
import type { SetKind } from "@/lib/tires";
import { POSITION_LABELS } from "@/lib/validation/labels";

type Variant = "primary" | "secondary";

/** The closed form's button as it looks while the form's code arrives. */
function Opening({ label, className, variant = "secondary" }: { label: string; className?: string; variant?: Variant }) {
  return (
    <Button type="button" variant={variant} size="sm" className={className} pending pendingLabel="Opening…">
      {label}
    </Button>
  );
}

const loadServiceEntryForm = () => import("./service-entry-form");
const loadSetSettings = () => import("./set-settings");
const loadEditEntry = () => import("./edit-entry");
const loadTireEditor = () => import("./tire-editor");
const loadSwapForm = () => import("./swap-form");

const ServiceEntryFormLazy = dynamic(() => import("./service-entry-form").then((m) => m.ServiceEntryForm), {
  ssr: false,
  loading: () => <Opening label="Add a service entry" />,
});
const SetSettingsLazy = dynamic(() => import("./set-settings").then((m) => m.SetSettings), {
  ssr: false,
  loading: () => <Opening label="Change the set's name or limits" />,
});
const TireEditorLazy = dynamic(() => import("./tire-editor").then((m) => m.TireEditor), {
  ssr: false,
  loading: () => <Opening label="Opening…" className="mt-2" />,
});
const SwapFormLazy = dynamic(() => import("./swap-form").then((m) => m.SwapForm), {
  ssr: false,
  loading: () => <Opening label="Put this set on the car" variant="primary" />,
});
export const EditCheck = dynamic(() => import("./edit-entry").then((m) => m.EditCheck), { ssr: false, loading: () => <FormLoading /> });
export const EditServiceEntry = dynamic(() => import("./edit-entry").then((m) => m.EditServiceEntry), { ssr: false, loading: () => <FormLoading /> });

/** Starts loading the edit forms' code (when a row's "Change" is reached), so opening one is quick. */
export const preloadEditEntry = () => void loadEditEntry();

/** A closed form's button; once pressed, the form (loaded on demand) takes its place, opened. */
function OnDemand({ label, className, variant = "secondary", preload, children }: { label: ReactNode; className?: string; variant?: Variant; preload: () => unknown; children: () => ReactNode }) {
  const [open, setOpen] = useState(false);
  if (open) return children();
  return (
    <Button type="button" variant={variant} size="sm" className={className} onPointerEnter={() => void preload()} onFocus={() => void preload()} onClick={() => setOpen(true)}>
      {label}
    </Button>
  );
}

type TireEditorProps = { tire: TireView; edit: { vehicleId: string; setId: string; kind: SetKind } };

/** A tire's "Correct the DOT code or position" (or "Add the DOT code") in the tire list. */
export function TireEditor(props: TireEditorProps) {
  const { tire } = props;
  const label = (
    <>
      {tire.dotCode ? "Correct the DOT code or position" : "Add the DOT code"}
      <span className="sr-only"> of the {POSITION_LABELS[tire.position].toLowerCase()} tire</span>
    </>
  );
  return (
    <OnDemand label={label} className="mt-2" preload={loadTireEditor}>
      {() => <TireEditorLazy {...props} startOpen />}
    </OnDemand>
  );
}

type ServiceProps = { vehicleId: string; sets: { id: string; name: string }[]; odometerUnit: "km" | "mi" };

/** "Add a service entry" on the vehicle page. */
export function NewServiceEntry(props: ServiceProps) {
  return (
    <OnDemand label="Add a service entry" preload={loadServiceEntryForm}>
      {() => <ServiceEntryFormLazy {...props} startOpen />}
    </OnDemand>
  );
}

/** "Change the set's name or limits" on the set page. */
export function SetSettings(props: { set: SetView; vehicleId: string }) {
  return (
    <OnDemand label="Change the set's name or limits" preload={loadSetSettings}>
      {() => <SetSettingsLazy {...props} startOpen />}
    </OnDemand>
  );
}

/** "Put this set on the car" on a stored set's card. */
export function SwapControl(props: { set: SetView; vehicleId: string; mounted: SetView | null }) {
  return (
    <OnDemand label="Put this set on the car" variant="primary" preload={loadSwapForm}>
      {() => <SwapFormLazy {...props} startOpen />}
    </OnDemand>
  );
}
