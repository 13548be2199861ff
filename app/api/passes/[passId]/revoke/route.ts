import { revokePass } from "@/db/queries/passes";
import { route } from "@/lib/api/handler";

export const POST = route<{ passId: string }>(async ({ session, params }) => ({
  pass: await revokePass({ session, passId: params.passId, now: new Date() }),
}));
