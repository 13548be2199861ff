import { z } from "zod";

const email = z
  .string()
  .trim()
  .min(3, "Enter an e-mail address.")
  .max(254, "At most 254 characters.")
  .pipe(z.email("Enter an e-mail address like name@example.com."))
  .transform((v) => v.toLowerCase());

export const inviteKeeperSchema = z.object({ email });
export type InviteKeeperInput = z.input<typeof inviteKeeperSchema>;

/** A link secret: 256 random bits, base64url. */
export const linkToken = z.string().regex(/^[A-Za-z0-9_-]{43}$/, "This link is not complete.");
export const tokenBodySchema = z.object({ token: linkToken });

export const handOnSchema = z.object({
  // Empty: a link the seller passes on themselves; otherwise sent to this address.
  email: z.union([z.literal(""), email]).optional().transform((v) => (v ? v : null)),
  includeReceipts: z.boolean().default(false),
  keepSnapshot: z.boolean().default(true),
});
export type HandOnInput = z.input<typeof handOnSchema>;

export const KEEPER_INVITE_DAYS = 14;
export const HAND_ON_DAYS = 14;
