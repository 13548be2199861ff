import "server-only";
// One wrapper for every route handler: it resolves the session, parses the
// JSON body with the route's zod schema, and turns errors into the one JSON
// error shape of the API.
import { NextResponse } from "next/server";
import type { z } from "zod";
import { sessionFromRequest, type Session } from "@/lib/auth/session";
import { requireSession } from "@/lib/auth/roles";
import { AppError, errorBody, toAppError } from "@/lib/errors";
import { appUrl } from "@/lib/env";
import { fieldErrors } from "@/lib/validation/fields";

type Params = Record<string, string | string[]>;

export type RouteContext<P extends Params> = { params: Promise<P> };

type HandlerArgs<P extends Params> = { req: Request; params: P; session: Session | null };

export function route<P extends Params = Params>(
  fn: (args: HandlerArgs<P>) => Promise<Response | unknown>,
  options: { auth?: "required" | "optional" } = {},
) {
  return async (req: Request, ctx: RouteContext<P>): Promise<Response> => {
    try {
      const session = await sessionFromRequest(req);
      if ((options.auth ?? "required") === "required") requireSession(session);
      const params = (await ctx?.params) ?? ({} as P);
      const result = await fn({ req, params, session });
      if (result instanceof Response) return result;
      return NextResponse.json(result ?? { ok: true });
    } catch (err) {
      const e = toAppError(err);
      return NextResponse.json(errorBody(e, appUrl()), { status: e.status });
    }
  };
}

/** Parses a JSON body with a zod schema, or throws a 422 naming each field. */
export async function parseJson<S extends z.ZodType>(req: Request, schema: S): Promise<z.output<S>> {
  let body: unknown;
  try {
    body = await req.json();
  } catch {
    throw new AppError("invalid", "The request body is not valid JSON.");
  }
  const parsed = schema.safeParse(body);
  if (!parsed.success) throw new AppError("invalid", "Some fields need attention.", fieldErrors(parsed.error));
  return parsed.data;
}

export const created = (body: unknown) => NextResponse.json(body, { status: 201 });
