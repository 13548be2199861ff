import "server-only";
import { createElement } from "react";
import ShopInvitationEmail from "@/emails/shop-invitation";
import { sendEmail } from "@/lib/email/send";
import { appUrl } from "@/lib/env";

export async function sendInvitation(input: {
  invitationId: string;
  email: string;
  shopName: string;
  inviterName: string;
}) {
  await sendEmail({
    to: input.email,
    subject: `${input.inviterName} invited you to ${input.shopName} on Fourpatch`,
    kind: "invitation",
    react: createElement(ShopInvitationEmail, {
      shopName: input.shopName,
      inviterName: input.inviterName,
      acceptUrl: `${appUrl()}/join/${input.invitationId}`,
    }),
  });
}
