// After sign-in every account is sent here, and on to its own home.
import { NextResponse } from "next/server";
import { homeFor } from "@/lib/auth/roles";
import { sessionFromRequest } from "@/lib/auth/session";

export const dynamic = "force-dynamic";

export async function GET(req: Request) {
  const session = await sessionFromRequest(req);
  const target = session ? await homeFor(session) : "/sign-in";
  return NextResponse.redirect(new URL(target, req.url));
}
