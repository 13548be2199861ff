"use client";
// The logbook answer carries the newest checks and service entries; this
// fetches the next older page of each and appends it to the cached logbook,
// so the history table shows it without reloading the rest.
import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { CheckView, ServiceView, VehicleLogbook } from "@/db/queries/logbook";
import { api, keys } from "./api";

type Page<K extends string, T> = { [key in K]: T[] } & { nextCursor: string | null };

export function useOlderHistory(book: VehicleLogbook) {
  const qc = useQueryClient();
  const id = book.vehicle.id;
  const mutation = useMutation({
    mutationFn: async () => {
      const [checks, service] = await Promise.all([
        book.checksNextCursor ? api<Page<"checks", CheckView>>(`/api/vehicles/${id}/checks?cursor=${encodeURIComponent(book.checksNextCursor)}`) : null,
        book.serviceNextCursor ? api<Page<"service", ServiceView>>(`/api/vehicles/${id}/service-entries?cursor=${encodeURIComponent(book.serviceNextCursor)}`) : null,
      ]);
      return { checks, service };
    },
    onSuccess: ({ checks, service }) => {
      qc.setQueryData<VehicleLogbook>(keys.vehicle(id), (old) =>
        old
          ? {
              ...old,
              checks: checks ? [...old.checks, ...checks.checks] : old.checks,
              checksNextCursor: checks ? checks.nextCursor : old.checksNextCursor,
              service: service ? [...old.service, ...service.service] : old.service,
              serviceNextCursor: service ? service.nextCursor : old.serviceNextCursor,
            }
          : old,
      );
    },
  });
  return { hasMore: Boolean(book.checksNextCursor || book.serviceNextCursor), loadMore: () => mutation.mutate(), loading: mutation.isPending, error: mutation.error };
}
