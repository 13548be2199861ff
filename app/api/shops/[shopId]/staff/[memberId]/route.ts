import { removeStaff } from "@/db/queries/shops";
import { route } from "@/lib/api/handler";

export const DELETE = route<{ shopId: string; memberId: string }>(async ({ session, params }) =>
  removeStaff({ session, shopId: params.shopId, memberId: params.memberId }),
);
