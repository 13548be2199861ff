import { acceptInvitation } from "@/db/queries/shops";
import { route } from "@/lib/api/handler";
import { LIMITS } from "@/lib/rate-limit";

export const POST = route<{ invitationId: string }>(async ({ req, session, params }) =>
  acceptInvitation({ session, headers: req.headers, invitationId: params.invitationId, now: new Date() }),
  { rateLimit: { ...LIMITS.joinShop, by: "user" } },
);
