import { acceptHandOn } from "@/db/queries/hand-on";
import { parseJson, route } from "@/lib/api/handler";
import { tokenBodySchema } from "@/lib/validation/household";

export const dynamic = "force-dynamic";

/** POST { token }: the signed-in account takes on the vehicle; the first accept wins. */
export const POST = route(async ({ req, session }) => {
  const { token } = await parseJson(req, tokenBodySchema);
  return acceptHandOn({ token, userId: session!.user.id, userEmail: session!.user.email });
});
