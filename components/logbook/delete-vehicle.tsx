"use client";
// Deleting a vehicle and everything logged for it, after a confirmation that says what goes.
import { useRouter } from "next/navigation";
import { toast } from "@/components/ui/toast";
import { useFormat } from "@/components/format/format-provider";
import { Button } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { ConfirmDialog } from "@/components/ui/confirm-dialog";
import { api } from "./api";

export function DeleteVehicle({ vehicleId, nickname, sets, entries, files }: { vehicleId: string; nickname: string; sets: number; entries: number; files: number }) {
  const router = useRouter();
  const f = useFormat();
  return (
    <Card className="space-y-3 border-condition-replace/30">
      <h2 className="text-lg font-bold">Delete this vehicle</h2>
      <p className="text-asphalt-700">Sold it or scrapped it? Deleting removes its sets, tread checks, service history and files for good.</p>
      <ConfirmDialog
        trigger={<Button type="button" variant="danger">Delete {nickname}</Button>}
        title={`Delete ${nickname}?`}
        description={
          <p>
            {f.count(sets, { one: "set", other: "sets" })}, {f.count(entries, { one: "history entry", other: "history entries" })} and {f.count(files, { one: "file", other: "files" })} go with it. This cannot be undone.
          </p>
        }
        confirmLabel="Delete the vehicle"
        onConfirm={async () => {
          await api(`/api/vehicles/${vehicleId}`, { method: "DELETE" });
          toast.success(`${nickname} is deleted.`);
          router.push("/vehicles");
          router.refresh();
        }}
      />
    </Card>
  );
}
