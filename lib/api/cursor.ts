// Opaque cursors for keyset pagination: a page ends at a row's sort key, and
// the next page starts strictly after it, so rows added meanwhile neither
// repeat nor vanish. A cursor is base64url JSON; a bad one is a 422 naming
// the `cursor` field, never a 500.
import { z } from "zod";
import { AppError } from "@/lib/errors";

export const DEFAULT_PAGE = 50;
export const MAX_PAGE = 200;

export function encodeCursor(value: Record<string, unknown>): string {
  return Buffer.from(JSON.stringify(value), "utf8").toString("base64url");
}

const badCursor = () => new AppError("invalid", "The page cursor is not valid. Start again from the first page.", { cursor: ["Not a cursor of this list."] });

export function decodeCursor<S extends z.ZodType>(raw: string | null | undefined, schema: S): z.output<S> | null {
  if (raw == null || raw === "") return null;
  if (raw.length > 512 || !/^[A-Za-z0-9_-]+$/.test(raw)) throw badCursor();
  let value: unknown;
  try {
    value = JSON.parse(Buffer.from(raw, "base64url").toString("utf8"));
  } catch {
    throw badCursor();
  }
  const parsed = schema.safeParse(value);
  if (!parsed.success) throw badCursor();
  return parsed.data;
}

/** `?limit=` within 1..MAX_PAGE, DEFAULT_PAGE when absent. */
export function pageLimit(raw: string | null | undefined, fallback = DEFAULT_PAGE): number {
  if (raw == null || raw === "") return fallback;
  const n = Number(raw);
  if (!Number.isInteger(n) || n < 1 || n > MAX_PAGE) throw new AppError("invalid", `The page size must be a whole number from 1 to ${MAX_PAGE}.`, { limit: [`From 1 to ${MAX_PAGE}.`] });
  return n;
}

/** A sort key of (timestamp or date, id), the shape most lists page by. */
export const timeIdCursor = z.object({ t: z.string().min(1).max(40), id: z.string().min(1).max(64) });
