"use client";
// The browser side of the logbook API: one fetch helper that turns the API's
// error shape into an exception carrying the per-field messages, and the
// cache keys of each resource.
import type { ApiErrorBody, ErrorCode, FieldErrors } from "@/lib/errors";

export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: ErrorCode | "network",
    message: string,
    readonly fields: FieldErrors = {},
  ) {
    super(message);
  }
}

export async function api<T>(url: string, opts: { method?: string; body?: unknown } = {}): Promise<T> {
  let res: Response;
  try {
    res = await fetch(url, {
      method: opts.method ?? (opts.body === undefined ? "GET" : "POST"),
      headers: opts.body === undefined ? undefined : { "content-type": "application/json" },
      body: opts.body === undefined ? undefined : JSON.stringify(opts.body),
      credentials: "same-origin",
    });
  } catch {
    throw new ApiError(0, "network", "The connection dropped. Nothing was saved; check your signal and try again.");
  }
  const data = (await res.json().catch(() => null)) as unknown;
  if (!res.ok) {
    const e = (data as ApiErrorBody | null)?.error;
    throw new ApiError(res.status, e?.code ?? "internal", e?.message ?? `The server answered ${res.status}. Nothing was saved.`, e?.fields ?? {});
  }
  return data as T;
}

export const keys = {
  vehicle: (id: string) => ["vehicle", id] as const,
  set: (id: string) => ["set", id] as const,
};
