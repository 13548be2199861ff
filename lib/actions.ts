import "server-only";
// One wrapper for every server action: session, role, safe-parse of the
// input, and a discriminated result with per-field errors. Server actions
// are public endpoints, so the checks run here every time.
import type { z } from "zod";
import { getSessionRecord, type Session } from "@/lib/auth/session";
import { requireAdmin, requireSession } from "@/lib/auth/roles";
import { toAppError, type ErrorCode, type FieldErrors } from "@/lib/errors";
import { fieldErrors } from "@/lib/validation/fields";
import { findHostileText, HOSTILE_TEXT_MESSAGE } from "@/lib/validation/text";

export type ActionResult<T = undefined> =
  | { status: "ok"; data: T; message?: string }
  | { status: "error"; message: string; fields?: FieldErrors; code?: ErrorCode };

type Role = "signed-in" | "admin";

export function action<S extends z.ZodType, T>(
  schema: S,
  options: { role?: Role },
  fn: (input: z.output<S>, ctx: { session: Session }) => Promise<T>,
) {
  return async (raw: z.input<S> | FormData): Promise<ActionResult<T>> => {
    try {
      const session = await getSessionRecord();
      const s = options.role === "admin" ? requireAdmin(session) : requireSession(session);
      const input = raw instanceof FormData ? Object.fromEntries(raw.entries()) : raw;
      // The same rule as route handlers: no control characters reach the database.
      const hostile = findHostileText(input);
      if (hostile !== null) return { status: "error", code: "invalid", message: "Some fields hold characters that are not allowed.", fields: { [hostile]: [HOSTILE_TEXT_MESSAGE] } };
      const parsed = schema.safeParse(input);
      if (!parsed.success) return { status: "error", code: "invalid", message: "Some fields need attention.", fields: fieldErrors(parsed.error) };
      const data = await fn(parsed.data, { session: s });
      return { status: "ok", data };
    } catch (err) {
      const e = toAppError(err);
      return { status: "error", code: e.code, message: e.safeMessage, fields: e.fields };
    }
  };
}
