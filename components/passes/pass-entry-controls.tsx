"use client";
// The technician's "Change" and "Delete" for a check or service entry the
// shop recorded under this pass. The server checks again that the pass is
// live, may add, and recorded the entry; each change lands in the driver's
// access log. The forms are the driver's own (components/logbook/edit-entry),
// loaded when "Change" is pressed (./pass-entry-edit).
import dynamic from "next/dynamic";
import { useRouter } from "next/navigation";
import { useRef, useState } from "react";
import { toast } from "@/components/ui/toast";
import { useFormat } from "@/components/format/format-provider";
import { FormLoading } from "@/components/ui/form-loading";
import { Button } from "@/components/ui/button";
import { ConfirmDialog } from "@/components/ui/confirm-dialog";
import type { CheckView, ServiceView, SetView } from "@/db/queries/logbook";
import type { DepthUnit, PressureUnit } from "@/lib/units";
import { SERVICE_KIND_LABELS } from "@/lib/validation/labels";
import { sendJson } from "./api";

const loadEdit = () => import("./pass-entry-edit");
const PassEntryEdit = dynamic(() => import("./pass-entry-edit").then((m) => m.PassEntryEdit), { ssr: false, loading: () => <FormLoading /> });
const preload = () => void loadEdit();

type Props = {
  passId: string;
  vehicle: { id: string; nickname: string; odometerUnit: "km" | "mi" };
  sets: SetView[];
  depthUnit: DepthUnit;
  pressureUnit: PressureUnit;
} & ({ check: CheckView; entry?: never } | { entry: ServiceView; check?: never });

export function PassEntryControls({ passId, vehicle, sets, depthUnit, pressureUnit, check, entry }: Props) {
  const f = useFormat();
  const router = useRouter();
  const [editing, setEditing] = useState(false);
  const boxRef = useRef<HTMLDivElement>(null);
  const base = `/api/passes/${passId}/vehicles/${vehicle.id}`;
  const url = check ? `${base}/checks/${check.id}` : `${base}/service/${entry!.id}`;
  const name = check ? `the tread check of ${f.date(check.checkedOn)}` : `the ${SERVICE_KIND_LABELS[entry!.kind].toLowerCase()} of ${f.date(entry!.performedOn)}`;
  const done = () => {
    setEditing(false);
    router.refresh();
  };
  return (
    <div className="mt-2 space-y-2">
      <div className="flex flex-wrap gap-2">
        <Button
          type="button"
          size="sm"
          variant="secondary"
          aria-expanded={editing}
          onPointerEnter={preload}
          onFocus={preload}
          onClick={() => {
            setEditing((x) => !x);
            requestAnimationFrame(() => boxRef.current?.scrollIntoView({ block: "start", behavior: "smooth" }));
          }}
        >
          Change<span className="sr-only"> {name}</span>
        </Button>
        <ConfirmDialog
          trigger={
            <Button type="button" size="sm" variant="ghost">
              Delete<span className="sr-only"> {name}</span>
            </Button>
          }
          title={`Delete ${name}?`}
          description={
            <p>
              {check
                ? "Its readings leave the driver's logbook and the wear chart."
                : "It leaves the driver's logbook with its files; tread checks taken with it stay."}{" "}
              The driver sees in the access log that the shop deleted it. This cannot be undone.
            </p>
          }
          confirmLabel="Delete it"
          onConfirm={async () => {
            const res = await sendJson(url, { method: "DELETE" });
            if (!res.ok) throw new Error(res.message);
            toast.success(`Deleted ${name} from the driver's logbook.`);
            router.refresh();
          }}
        />
      </div>
      {editing ? (
        <div ref={boxRef} className="scroll-mt-24 rounded-lg border border-groove-300 bg-white p-3" data-testid="pass-edit">
          {check ? (
            <PassEntryEdit check={check} url={url} vehicle={vehicle} sets={sets} depthUnit={depthUnit} pressureUnit={pressureUnit} onDone={done} />
          ) : (
            <PassEntryEdit entry={entry!} url={url} vehicle={vehicle} sets={sets} depthUnit={depthUnit} pressureUnit={pressureUnit} onDone={done} />
          )}
        </div>
      ) : null}
    </div>
  );
}
