// The driver's passes: list them, or give a shop a new one.
import { issuePass, listDriverPasses } from "@/db/queries/passes";
import { created, parseJson, route } from "@/lib/api/handler";
import { issuePassSchema } from "@/lib/validation/passes";

export const dynamic = "force-dynamic";

export const GET = route(async ({ session }) => ({ passes: await listDriverPasses({ session, now: new Date() }) }));

export const POST = route(async ({ req, session }) => {
  const input = await parseJson(req, issuePassSchema);
  return created({ pass: await issuePass({ session, input, now: new Date() }) });
});
