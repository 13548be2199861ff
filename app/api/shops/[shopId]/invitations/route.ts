import { inviteTechnician } from "@/db/queries/shops";
import { created, parseJson, route } from "@/lib/api/handler";
import { inviteSchema } from "@/lib/validation/shops";

export const POST = route<{ shopId: string }>(async ({ req, session, params }) => {
  const { email } = await parseJson(req, inviteSchema);
  return created({ invitation: await inviteTechnician({ session, headers: req.headers, shopId: params.shopId, email }) });
});
