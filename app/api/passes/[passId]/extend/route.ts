import { extendPass } from "@/db/queries/passes";
import { parseJson, route } from "@/lib/api/handler";
import { extendPassSchema } from "@/lib/validation/passes";

export const POST = route<{ passId: string }>(async ({ req, session, params }) => {
  const input = await parseJson(req, extendPassSchema);
  return { pass: await extendPass({ session, passId: params.passId, input, now: new Date() }) };
});
