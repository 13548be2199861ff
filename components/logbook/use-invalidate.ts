// Forms that also open inside a live logbook (a check or service entry changed
// from the vehicle page) mark its cached data stale after saving. On a page of
// their own there is no query client (see query-island.tsx) and nothing to
// mark: they go on to a page the server renders fresh. Reading the context
// directly keeps the query library itself off those pages.
import { QueryClientContext } from "@tanstack/react-query";
import { useCallback, useContext } from "react";

export function useInvalidate() {
  const client = useContext(QueryClientContext);
  return useCallback(
    async (...queryKeys: (readonly unknown[])[]) => {
      if (client) await Promise.all(queryKeys.map((queryKey) => client.invalidateQueries({ queryKey })));
    },
    [client],
  );
}
