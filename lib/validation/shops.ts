// Shops: creating one, its public profile, inviting staff, the directory.
import { z } from "zod";
import { isSingleLine } from "./text";
import { email } from "./auth";

const optionalText = (max: number, message: string) =>
  z.preprocess((v) => (typeof v === "string" && v.trim() === "" ? undefined : v), z.string().trim().max(max, message).optional());

export const shopProfileSchema = z.object({
  // Shop names reach e-mail subjects: one line only.
  name: z.string().trim().min(2, "Give the shop a name.").max(80, "Keep the name under 80 characters.").refine(isSingleLine, "Keep the name on one line."),
  town: z.string().trim().min(2, "Say which town the shop is in.").max(80, "Keep the town under 80 characters.").refine(isSingleLine, "Keep the town on one line."),
  address: optionalText(160, "Keep the address under 160 characters."),
  phone: z.preprocess(
    (v) => (typeof v === "string" && v.trim() === "" ? undefined : v),
    z
      .string()
      .trim()
      .max(40, "Keep the phone number under 40 characters.")
      .regex(/^[+0-9 ()./-]+$/, "Use digits, spaces and + ( ) - only.")
      .optional(),
  ),
  email: z.preprocess((v) => (typeof v === "string" && v.trim() === "" ? undefined : v), email.optional()),
  about: optionalText(600, "Keep the description under 600 characters."),
});

export const createShopSchema = shopProfileSchema;

export const inviteSchema = z.object({ email });

export const directoryQuerySchema = z.object({
  q: z.string().trim().max(80).optional().default(""),
});

export type ShopProfileInput = z.input<typeof shopProfileSchema>;
