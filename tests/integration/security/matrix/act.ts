// Calling server actions as an actor: matrix.test.ts stands in for Next's
// request scope (next/headers) with the headers set here.
import { AppError, type ErrorCode } from "@/lib/errors";
import type { Actor, Outcome } from "./types";
import type { World } from "./world";

const g = globalThis as unknown as { __matrixHeaders?: Headers };

export async function asActor<T>(w: World, a: Actor, fn: () => Promise<T>): Promise<T> {
  const u = w.userOf(a);
  g.__matrixHeaders = new Headers(u ? { cookie: u.cookie } : {});
  try {
    return await fn();
  } finally {
    g.__matrixHeaders = undefined;
  }
}

/** An action's result as the status a route handler would have answered. */
export function outcome(r: { status: string; code?: ErrorCode }): Outcome {
  if (r.status === "ok") return { status: 200 };
  return { status: new AppError(r.code ?? "internal", "").status };
}
