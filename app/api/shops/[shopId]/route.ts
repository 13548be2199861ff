// A shop's profile and staff: its owner's to read and edit.
import { getShopForOwner, updateShopProfile } from "@/db/queries/shops";
import { parseJson, route } from "@/lib/api/handler";
import { requireShopMember } from "@/lib/auth/roles";
import { shopProfileSchema } from "@/lib/validation/shops";

export const dynamic = "force-dynamic";

export const GET = route<{ shopId: string }>(async ({ session, params }) => {
  const { profile, staff, invitations } = await getShopForOwner({ session, shopId: params.shopId, now: new Date() });
  return { profile, staff, invitations };
});

export const PATCH = route<{ shopId: string }>(async ({ req, session, params }) => {
  // The owner check comes before the body is judged: a technician learns nothing from validation messages.
  await requireShopMember(session, { shopId: params.shopId, role: "owner" });
  const input = await parseJson(req, shopProfileSchema);
  return { shop: await updateShopProfile({ session, shopId: params.shopId, input }) };
});
