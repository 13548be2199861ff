// A consistent copy of the embedded database while the server runs (`npm run
// backup` calls this, since no second process may open the PGlite folder).
// Authorization: Bearer <CRON_SECRET>; without a configured secret the route stays shut.
import { createHash, timingSafeEqual } from "node:crypto";
import { dumpEmbeddedDatabase } from "@/db";
import { route } from "@/lib/api/handler";
import { env } from "@/lib/env";
import { AppError } from "@/lib/errors";

export const dynamic = "force-dynamic";

function authorised(req: Request): boolean {
  const secret = env().CRON_SECRET;
  const header = req.headers.get("authorization") ?? "";
  if (!secret || !header.startsWith("Bearer ")) return false;
  const a = createHash("sha256").update(header.slice(7)).digest();
  const b = createHash("sha256").update(secret).digest();
  return timingSafeEqual(a, b);
}

export const POST = route(
  async ({ req }) => {
    if (!authorised(req)) throw new AppError("unauthenticated", "A valid operations secret (CRON_SECRET) is required.");
    const dump = await dumpEmbeddedDatabase();
    if (!dump) throw new AppError("conflict", "This server runs on PostgreSQL: back it up with pg_dump.");
    return new Response(dump, { headers: { "content-type": "application/gzip", "cache-control": "no-store", "content-disposition": 'attachment; filename="pgdata.tar.gz"' } });
  },
  {
    auth: "optional",
    // Called by `npm run backup`, never by a browser: the bearer secret is the permission, not a cookie.
    crossSite: { allowedBecause: "authenticated by the CRON_SECRET bearer token" },
  },
);
