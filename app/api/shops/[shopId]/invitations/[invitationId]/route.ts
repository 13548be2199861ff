import { cancelInvitation } from "@/db/queries/shops";
import { route } from "@/lib/api/handler";

export const DELETE = route<{ shopId: string; invitationId: string }>(async ({ session, params }) =>
  cancelInvitation({ session, shopId: params.shopId, invitationId: params.invitationId }),
);
