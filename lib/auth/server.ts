import "server-only";
import { betterAuth } from "better-auth";
import { drizzleAdapter } from "better-auth/adapters/drizzle";
import { nextCookies } from "better-auth/next-js";
import { admin, organization } from "better-auth/plugins";
import { createElement } from "react";
import { db } from "@/db";
import * as schema from "@/db/schema";
import { appUrl, env } from "@/lib/env";
import { sendEmail } from "@/lib/email/send";
import PasswordResetEmail from "@/emails/password-reset";
import WelcomeEmail from "@/emails/welcome";
import { ac, shopRoles } from "./access";
import { onboardNewUser } from "./onboarding";
import { sendInvitation } from "./invitations";

// A fixed development secret keeps local sessions stable across restarts; a
// production deployment must set BETTER_AUTH_SECRET (checked at boot).
const DEV_SECRET = "fourpatch-development-secret-change-me-0123456789";

function secret() {
  const s = env().BETTER_AUTH_SECRET;
  if (!s && process.env.NODE_ENV === "production" && process.env.FOURPATCH_ALLOW_DEV_SECRET !== "1") {
    throw new Error("BETTER_AUTH_SECRET must be set in production (see README: Environment).");
  }
  return s ?? DEV_SECRET;
}

function createAuth() {
  return betterAuth({
    appName: "Fourpatch",
    baseURL: appUrl(),
    secret: secret(),
    database: drizzleAdapter(db, { provider: "pg", schema }),
    emailAndPassword: {
      enabled: true,
      minPasswordLength: 10,
      resetPasswordTokenExpiresIn: 60 * 60,
      revokeSessionsOnPasswordReset: true,
      sendResetPassword: async ({ user, url }) => {
        await sendEmail({
          to: user.email,
          subject: "Choose a new Fourpatch password",
          kind: "password-reset",
          react: createElement(PasswordResetEmail, { name: user.name, resetUrl: url }),
        });
      },
    },
    databaseHooks: {
      user: {
        create: {
          after: async (user) => {
            await onboardNewUser({ userId: user.id });
            await sendEmail({
              to: user.email,
              subject: "Your Fourpatch logbook is ready",
              kind: "welcome",
              react: createElement(WelcomeEmail, { name: user.name, vehiclesUrl: `${appUrl()}/vehicles` }),
            });
          },
        },
      },
    },
    rateLimit: {
      enabled: process.env.FOURPATCH_AUTH_RATE_LIMIT !== "off",
      window: 60,
      max: 200,
      customRules: {
        "/sign-in/email": { window: 60, max: 10 },
        "/sign-up/email": { window: 60, max: 10 },
        "/request-password-reset": { window: 60, max: 5 },
      },
    },
    advanced: {
      // Behind the loopback there is no proxy header; count by the socket's peer.
      ipAddress: { ipAddressHeaders: ["x-forwarded-for", "x-real-ip"] },
    },
    plugins: [
      admin({ defaultRole: "user", adminRoles: ["admin"] }),
      organization({
        ac,
        roles: shopRoles,
        creatorRole: "owner",
        invitationExpiresIn: 60 * 60 * 24 * 3,
        sendInvitationEmail: async (data) => {
          await sendInvitation({
            invitationId: data.id,
            email: data.email,
            shopName: data.organization.name,
            inviterName: data.inviter.user.name,
          });
        },
      }),
      nextCookies(),
    ],
  });
}

type Auth = ReturnType<typeof createAuth>;
const globalForAuth = globalThis as unknown as { __fourpatchAuth?: Auth };

export function getAuth(): Auth {
  globalForAuth.__fourpatchAuth ??= createAuth();
  return globalForAuth.__fourpatchAuth;
}

// Lazy, so that importing this module opens nothing until a request needs it.
export const auth: Auth = new Proxy({} as Auth, {
  get(_t, prop) {
    return Reflect.get(getAuth() as object, prop);
  },
  has(_t, prop) {
    return Reflect.has(getAuth() as object, prop);
  },
});
