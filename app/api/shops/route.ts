// The shop directory (any signed-in account) and opening a new shop.
import { createShop, searchShops } from "@/db/queries/shops";
import { created, parseJson, route } from "@/lib/api/handler";
import { AppError } from "@/lib/errors";
import { fieldErrors } from "@/lib/validation/fields";
import { createShopSchema, directoryQuerySchema } from "@/lib/validation/shops";

export const dynamic = "force-dynamic";

export const GET = route(async ({ req }) => {
  const parsed = directoryQuerySchema.safeParse({ q: new URL(req.url).searchParams.get("q") ?? "" });
  if (!parsed.success) throw new AppError("invalid", "Some fields need attention.", fieldErrors(parsed.error));
  const { q } = parsed.data;
  return { shops: await searchShops({ q }) };
});

export const POST = route(async ({ req, session }) => {
  const input = await parseJson(req, createShopSchema);
  return created({ shop: await createShop({ session, input }) });
});
