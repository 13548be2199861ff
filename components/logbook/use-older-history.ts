"use client";
// The logbook answer carries the newest checks and service entries; this
// fetches the next older page of each and appends it to the cached logbook,
// so the history table shows it without reloading the rest.
import { useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import type { CheckView, ServiceView, VehicleLogbook } from "@/db/queries/logbook";
import { api, keys } from "./api";

type Page<K extends string, T> = { [key in K]: T[] } & { nextCursor: string | null };

export function useOlderHistory(book: VehicleLogbook) {
  const qc = useQueryClient();
  const id = book.vehicle.id;
  // Plain state rather than a mutation hook: the page's first load carries no mutation code.
  const [loading, setLoading] = useState(false);
  const [error, setError] = useState<Error | null>(null);
  const loadMore = async () => {
    setLoading(true);
    setError(null);
    try {
      const [checks, service] = await Promise.all([
        book.checksNextCursor ? api<Page<"checks", CheckView>>(`/api/vehicles/${id}/checks?cursor=${encodeURIComponent(book.checksNextCursor)}`) : null,
        book.serviceNextCursor ? api<Page<"service", ServiceView>>(`/api/vehicles/${id}/service-entries?cursor=${encodeURIComponent(book.serviceNextCursor)}`) : null,
      ]);
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
    } catch (e) {
      setError(e instanceof Error ? e : new Error("The older entries could not be loaded."));
    } finally {
      setLoading(false);
    }
  };
  return { hasMore: Boolean(book.checksNextCursor || book.serviceNextCursor), loadMore: () => void loadMore(), loading, error };
}
