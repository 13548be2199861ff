"use client";
// One vehicle's logbook: its sets (with the seasonal swap), files, history
// and the shops' access log. Data through TanStack Query, seeded by the server.
import { AccessLogTable } from "@/components/passes/access-log-table";
import { VehicleSharing } from "@/components/household/vehicle-sharing";
import { useQuery, useQueryClient } from "@tanstack/react-query";
import { QueryIsland } from "./query-island";
import { FileText, Image as ImageIcon } from "lucide-react";
import Link from "next/link";
import { useCallback, useMemo, useRef, useState } from "react";
import { toast } from "@/components/ui/toast";
import { ConfirmDialog } from "@/components/ui/confirm-dialog";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { buttonVariants } from "@/components/ui/button-variants";
import { Card } from "@/components/ui/card";
import { ConditionBadge } from "@/components/ui/condition-badge";
import { PageHeader } from "@/components/ui/page-header";
import { SafetyNote } from "@/components/ui/safety-note";
import type { SetView, VehicleLogbook } from "@/db/queries/logbook";
import { depthUnitFor } from "@/lib/units";
import type { SetKind } from "@/lib/tires";
import { SET_KIND_LABELS } from "@/lib/validation/labels";
import { api, keys } from "./api";
import { linkClass, setTitle } from "./format";
import { useFormat } from "@/components/format/format-provider";
import { HistoryTable, historyRows, type HistoryRow } from "./history-table";
// The forms that open on request load their code (and zod, react-hook-form) when opened.
import { EditCheck, EditServiceEntry, NewServiceEntry, SwapControl, preloadEditEntry } from "./lazy-forms";
import { TireList } from "./tire-list";
import { useOlderHistory } from "./use-older-history";

/** The logbook brings the newest history; older entries load on request. */
function OlderHistory({ book }: { book: VehicleLogbook }) {
  const older = useOlderHistory(book);
  if (!older.hasMore) return null;
  return (
    <div className="flex flex-wrap items-center gap-3">
      <Button type="button" variant="secondary" onClick={older.loadMore} disabled={older.loading} data-testid="older-history">
        {older.loading ? "Loading…" : "Load older entries"}
      </Button>
      {older.error ? <p role="alert" className="text-sm text-red-800">{older.error.message}</p> : null}
    </div>
  );
}

/**
 * `queryUrl` and `canManage` let a shop's page show the same logbook under a
 * pass: read from its own route, without the owner's purchase and swap actions.
 */
export function VehicleLogbookView(props: Parameters<typeof Logbook>[0]) {
  return (
    <QueryIsland>
      <Logbook {...props} />
    </QueryIsland>
  );
}

function Logbook({
  initial,
  saved,
  queryUrl,
  canManage = true,
}: {
  initial: VehicleLogbook;
  saved?: string;
  queryUrl?: string;
  canManage?: boolean;
}) {
  const f = useFormat();
  const id = initial.vehicle.id;
  const { data } = useQuery({ queryKey: keys.vehicle(id), queryFn: () => api<VehicleLogbook>(queryUrl ?? `/api/vehicles/${id}`), initialData: initial });
  const book = data ?? initial;
  const v = book.vehicle;
  const depthUnit = depthUnitFor(book.viewer.units);
  const distanceUnit = v.odometerUnit;
  const mounted = book.sets.find((s) => s.state === "mounted") ?? null;
  // Rows are worked out again only when the logbook itself changes.
  const rows = useMemo(() => historyRows(book, depthUnit, f), [book, depthUnit, f]);
  const queryClient = useQueryClient();
  const deleteEntry = useCallback(
    async (row: HistoryRow) => {
      const [kind, ...rest] = row.id.split("-");
      const entryId = rest.join("-");
      await api(kind === "c" ? `/api/checks/${entryId}` : `/api/service-entries/${entryId}`, { method: "DELETE" });
      toast.success(`${row.type} of ${f.date(row.date)} deleted.`);
      await queryClient.invalidateQueries({ queryKey: keys.vehicle(id) });
    },
    [f, id, queryClient],
  );
  // The entry being changed: its form opens above the table and takes the focus.
  const [editing, setEditing] = useState<HistoryRow | null>(null);
  const editRef = useRef<HTMLDivElement>(null);
  const editEntry = useCallback((row: HistoryRow) => {
    setEditing(row);
    requestAnimationFrame(() => {
      editRef.current?.scrollIntoView({ block: "start", behavior: "smooth" });
      editRef.current?.focus({ preventScroll: true });
    });
  }, []);
  const editingId = editing ? editing.id.slice(2) : null;
  const editingCheck = editing?.id.startsWith("c-") ? book.checks.find((c) => c.id === editingId) : undefined;
  const editingEntry = editing?.id.startsWith("s-") ? book.service.find((s) => s.id === editingId) : undefined;
  const editCommon = {
    vehicle: { id, nickname: v.nickname, odometerUnit: distanceUnit },
    sets: book.sets,
    depthUnit,
    pressureUnit: book.viewer.pressureUnit,
    onDone: () => setEditing(null),
  };

  return (
    <>
      <PageHeader
        title={v.nickname}
        description={`${v.make} ${v.model}${v.year ? ` · ${v.year}` : ""}${v.plate ? ` · ${v.plate}` : ""}${book.lastOdometer ? ` · ${f.distance(book.lastOdometer.odometerKm, distanceUnit)} on ${f.date(book.lastOdometer.date)}` : ""}`}
        actions={
          canManage ? (
          <>
            <Link href={`/vehicles/${id}/check`} className={buttonVariants()}>
              Record a tread check
            </Link>
            <Link href={`/log-purchase?vehicle=${id}`} className={buttonVariants({ variant: "secondary" })}>
              Log a purchase
            </Link>
            <Link href={`/vehicles/${id}/edit`} className={buttonVariants({ variant: "ghost" })}>
              Change or delete the vehicle
            </Link>
          </>
          ) : null
        }
      />
      {saved === "set" ? <Alert tone="success" className="mb-4">The new set is saved in the logbook.</Alert> : null}
      {saved === "vehicle" ? <Alert tone="success" className="mb-4">The vehicle is saved.</Alert> : null}
      {saved === "check" ? <Alert tone="success" className="mb-4">The tread check is saved.</Alert> : null}

      <section aria-labelledby="sets-h" className="mb-8 space-y-4">
        <h2 id="sets-h" className="text-xl font-bold">
          Tire sets
        </h2>
        {book.sets.length === 0 ? (
          <Card>
            <p>No sets yet. <Link href={`/log-purchase?vehicle=${id}`} className={linkClass}>Log the tires on this vehicle</Link>.</p>
          </Card>
        ) : null}
        {book.sets.map((s) => (
          <SetCard key={s.id} set={s} vehicleId={id} mounted={mounted} depthUnit={depthUnit} files={book.attachments.filter((a) => a.setId === s.id)} canManage={canManage} />
        ))}
        <SafetyNote compact />
      </section>

      <section aria-labelledby="history-h" className="mb-8 space-y-3">
        <h2 id="history-h" className="text-xl font-bold">
          History
        </h2>
        {canManage ? (
          <NewServiceEntry vehicleId={id} sets={book.sets.filter((s) => s.state !== "retired").map((s) => ({ id: s.id, name: setTitle(s) }))} odometerUnit={distanceUnit} />
        ) : null}
        {editing && (editingCheck || editingEntry) ? (
          <div ref={editRef} tabIndex={-1} className="scroll-mt-24 outline-none" data-testid="edit-entry">
            <Card className="space-y-3 border-groove-300">
              <h3 className="text-lg font-bold">
                Change the {editing.type.toLowerCase()} of {f.date(editing.date)}
              </h3>
              {editingCheck ? <EditCheck key={editingCheck.id} check={editingCheck} url={`/api/checks/${editingCheck.id}`} {...editCommon} /> : null}
              {editingEntry ? <EditServiceEntry key={editingEntry.id} entry={editingEntry} url={`/api/service-entries/${editingEntry.id}`} {...editCommon} /> : null}
            </Card>
          </div>
        ) : null}
        <HistoryTable rows={rows} distanceUnit={distanceUnit} onDelete={canManage ? deleteEntry : undefined} onEdit={canManage ? editEntry : undefined} onEditIntent={canManage ? preloadEditEntry : undefined} />
        {canManage ? <OlderHistory book={book} /> : null}
      </section>

      <section aria-labelledby="files-h" className="mb-8 space-y-3">
        <h2 id="files-h" className="text-xl font-bold">
          Receipts and photos
        </h2>
        {book.attachments.length === 0 ? <p className="text-asphalt-600">None yet.</p> : <FileList files={book.attachments} deletable={canManage ? id : undefined} />}
      </section>

      {canManage ? <VehicleSharing vehicleId={id} nickname={v.nickname} /> : null}

      {canManage && book.role === "owner" ? (
        <section aria-labelledby="log-h" className="mb-8 space-y-3">
          <h2 id="log-h" className="text-xl font-bold">
            Who looked at this logbook
          </h2>
          {book.accessLog.length === 0 ? (
            <p className="text-asphalt-600">No shop has opened this logbook. Give a shop a pass from <Link href="/passes" className={linkClass}>Shop passes</Link>.</p>
          ) : (
            <AccessLogTable rows={book.accessLog} />
          )}
        </section>
      ) : null}
    </>
  );
}

function SetCard({
  set,
  vehicleId,
  mounted,
  depthUnit,
  files,
  canManage,
}: {
  set: SetView;
  vehicleId: string;
  mounted: SetView | null;
  depthUnit: "mm" | "32nds";
  files: VehicleLogbook["attachments"];
  canManage: boolean;
}) {
  const f = useFormat();
  const state =
    set.state === "mounted" ? "On the car" : set.state === "stored" ? `Stored${set.storageLocation ? ` at ${set.storageLocation}` : ""}` : "Retired";
  return (
    <Card className="space-y-3" data-testid="set-card">
      <div className="flex flex-wrap items-start justify-between gap-2">
        <div>
          <h3 className="text-lg font-bold">
            {canManage ? (
              <Link href={`/sets/${set.id}`} className={linkClass}>
                {setTitle(set)}
              </Link>
            ) : (
              setTitle(set)
            )}
          </h3>
          <p className="text-sm text-asphalt-600">
            {SET_KIND_LABELS[set.kind]} · {set.size} · {state}
            {set.purchasedOn ? ` · bought ${f.date(set.purchasedOn)}` : ""}
            {set.seller ? ` from ${set.seller}` : ""}
            {set.priceCents != null ? ` · ${f.money(set.priceCents, set.currency)}` : ""}
          </p>
        </div>
        {set.condition ? <ConditionBadge condition={set.condition} detail="set" /> : null}
      </div>
      <TireList tires={set.tires} depthUnit={depthUnit} limitMm={set.limit.minMm} edit={canManage ? { vehicleId, setId: set.id, kind: set.kind.replace("_", "-") as SetKind } : undefined} />
      {set.axleAdvice.length ? (
        <ul className="list-disc pl-5 text-sm text-asphalt-700">
          {set.axleAdvice.map((a) => (
            <li key={a}>{a}</li>
          ))}
        </ul>
      ) : null}
      {files.length ? <FileList files={files} /> : null}
      <div className="flex flex-wrap gap-2">
        {canManage ? (
          <Link href={`/sets/${set.id}`} className={buttonVariants({ variant: "secondary", size: "sm" })}>
            Wear chart and details
          </Link>
        ) : null}
        {canManage && set.state === "stored" ? <SwapControl set={set} vehicleId={vehicleId} mounted={mounted} /> : null}
      </div>
    </Card>
  );
}

/** `deletable` (the vehicle's id) adds a delete button with a confirmation to each file. */
function FileList({ files, deletable }: { files: VehicleLogbook["attachments"]; deletable?: string }) {
  const fmt = useFormat();
  const queryClient = useQueryClient();
  return (
    <ul className="flex flex-wrap gap-2" aria-label="Files">
      {files.map((f) => (
        <li key={f.id} className="flex items-center">
          <a href={`/api/attachments/${f.id}`} target="_blank" rel="noreferrer" className="inline-flex min-h-11 items-center gap-2 rounded border border-asphalt-200 bg-white px-3 text-sm">
            {f.mimeType.startsWith("image/") ? <ImageIcon aria-hidden className="size-4" /> : <FileText aria-hidden className="size-4" />}
            <span>
              {f.kind === "receipt" ? "Receipt" : f.kind === "photo" ? "Photo" : "Document"}: {f.fileName} <span className="text-asphalt-600">({fmt.bytes(f.sizeBytes)})</span>
            </span>
          </a>
          {deletable ? (
            <ConfirmDialog
              trigger={
                <Button type="button" size="sm" variant="ghost" className="ml-1">
                  Delete<span className="sr-only"> {f.fileName}</span>
                </Button>
              }
              title={`Delete ${f.fileName}?`}
              description={<p>The file leaves the logbook for good. The set and its history stay.</p>}
              confirmLabel="Delete the file"
              onConfirm={async () => {
                await api(`/api/attachments/${f.id}`, { method: "DELETE" });
                toast.success(`${f.fileName} deleted.`);
                await queryClient.invalidateQueries({ queryKey: keys.vehicle(deletable) });
              }}
            />
          ) : null}
        </li>
      ))}
    </ul>
  );
}
