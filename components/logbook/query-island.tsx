"use client";
// A TanStack Query client for one page's live logbook (the vehicle page, the
// set page, a technician's edit form): the pages whose data changes under
// them. The driver layout holds none, so the pages that only show a form
// (log a purchase, the check form, the vehicle form, account, reminders,
// passes) do not load the query library at all. A client lives as long as its
// page: each visit starts from the data the server just rendered.
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { useState, type ReactNode } from "react";

export function QueryIsland({ children }: { children: ReactNode }) {
  const [client] = useState(
    () =>
      new QueryClient({
        defaultOptions: {
          // Pages arrive with fresh server data; refetch only when a mutation says so or the tab returns.
          queries: { staleTime: 30_000, retry: 1 },
        },
      }),
  );
  return <QueryClientProvider client={client}>{children}</QueryClientProvider>;
}
