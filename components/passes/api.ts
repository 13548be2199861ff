// A small JSON client for the pass and shop route handlers, used by forms.
import type { ApiErrorBody, FieldErrors } from "@/lib/errors";

export type ApiResult<T> = { ok: true; data: T } | { ok: false; status: number; code: string; message: string; fields?: FieldErrors };

export async function sendJson<T = unknown>(url: string, opts: { method?: string; body?: unknown } = {}): Promise<ApiResult<T>> {
  let res: Response;
  try {
    res = await fetch(url, {
      method: opts.method ?? "POST",
      headers: opts.body !== undefined ? { "content-type": "application/json" } : undefined,
      body: opts.body !== undefined ? JSON.stringify(opts.body) : undefined,
    });
  } catch {
    return { ok: false, status: 0, code: "network", message: "No connection to Fourpatch. Nothing was saved; check the network and try again." };
  }
  const json = (await res.json().catch(() => null)) as unknown;
  if (res.ok) return { ok: true, data: json as T };
  const err = (json as ApiErrorBody | null)?.error;
  return { ok: false, status: res.status, code: err?.code ?? "internal", message: err?.message ?? "Something went wrong. Please try again.", fields: err?.fields };
}
