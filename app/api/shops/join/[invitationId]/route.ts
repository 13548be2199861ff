import { acceptInvitation } from "@/db/queries/shops";
import { route } from "@/lib/api/handler";

export const POST = route<{ invitationId: string }>(async ({ req, session, params }) =>
  acceptInvitation({ session, headers: req.headers, invitationId: params.invitationId, now: new Date() }),
);
