import { acceptKeeper } from "@/db/queries/keepers";
import { parseJson, route } from "@/lib/api/handler";
import { tokenBodySchema } from "@/lib/validation/household";

export const dynamic = "force-dynamic";

/** POST { token }: the invited account becomes a co-keeper. */
export const POST = route(async ({ req, session }) => {
  const { token } = await parseJson(req, tokenBodySchema);
  return acceptKeeper({ token, userId: session!.user.id, userEmail: session!.user.email });
});
