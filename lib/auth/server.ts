import "server-only";
import { betterAuth } from "better-auth";
import { APIError } from "better-auth/api";
import { drizzleAdapter } from "better-auth/adapters/drizzle";
import { nextCookies } from "better-auth/next-js";
import { admin, organization } from "better-auth/plugins";
import { createElement } from "react";
import { eq } from "drizzle-orm";
import { db } from "@/db";
import * as schema from "@/db/schema";
import { appUrl, env } from "@/lib/env";
import { sendEmail, sendEmailInBackground } from "@/lib/email/send";
import PasswordResetEmail from "@/emails/password-reset";
import SignUpAttemptEmail from "@/emails/sign-up-attempt";
import VerifyEmail from "@/emails/verify-email";
import WelcomeEmail from "@/emails/welcome";
import { isSingleLine } from "@/lib/validation/text";
import { ac, shopRoles } from "./access";
import { CLIENT_ADDRESS_HEADER } from "./endpoints";
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
      // No session until the address is confirmed through the link, and sign-up
      // answers an address that has an account exactly like a new one (no
      // enumeration): the owner gets an e-mail instead.
      requireEmailVerification: true,
      // Not awaited, like every mail below that depends on whether the address has an account.
      onExistingUserSignUp: async ({ user }) => {
        sendEmailInBackground({
          to: user.email,
          subject: "Someone tried to sign up with your address",
          kind: "sign-up-attempt",
          react: createElement(SignUpAttemptEmail, { name: user.name, signInUrl: `${appUrl()}/sign-in`, resetUrl: `${appUrl()}/forgot-password` }),
        });
      },
      // Following the reset link proves the address as well as the verification link does.
      onPasswordReset: async ({ user }) => {
        if (!user.emailVerified) await db.update(schema.user).set({ emailVerified: true }).where(eq(schema.user.id, user.id));
      },
      // Not awaited: the answer must not take longer for an address that has an account.
      sendResetPassword: async ({ user, url }) => {
        sendEmailInBackground({
          to: user.email,
          subject: "Choose a new Fourpatch password",
          kind: "password-reset",
          react: createElement(PasswordResetEmail, { name: user.name, resetUrl: url }),
        });
      },
    },
    emailVerification: {
      sendOnSignUp: true,
      // Sign-in of an unconfirmed account answers 403 EMAIL_NOT_VERIFIED; the
      // form offers "send the link again" (POST /send-verification-email).
      sendOnSignIn: false,
      autoSignInAfterVerification: true,
      expiresIn: 60 * 60 * 24,
      sendVerificationEmail: async ({ user, url }) => {
        sendEmailInBackground({
          to: user.email,
          subject: "Confirm your address for Fourpatch",
          kind: "verify-email",
          react: createElement(VerifyEmail, { name: user.name, verifyUrl: url }),
        });
      },
      afterEmailVerification: async (user) => {
        await sendEmail({
          to: user.email,
          subject: "Your Fourpatch logbook is ready",
          kind: "welcome",
          react: createElement(WelcomeEmail, { name: user.name, vehiclesUrl: `${appUrl()}/vehicles` }),
        });
      },
    },
    databaseHooks: {
      user: {
        create: {
          // Display names reach e-mail subjects and shop screens: one line, no control characters.
          before: async (u) => {
            if (!isSingleLine(u.name) || u.name.trim().length === 0 || u.name.length > 80) {
              throw new APIError("BAD_REQUEST", { message: "Use a name of at most 80 characters on one line." });
            }
            return { data: u };
          },
          after: async (user) => {
            await onboardNewUser({ userId: user.id });
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
        "/send-verification-email": { window: 60, max: 5 },
      },
    },
    advanced: {
      // The client's real address, set by lib/auth/endpoints.ts from the socket
      // (or from X-Forwarded-For only behind FOURPATCH_TRUSTED_PROXY); never a header the client chose.
      ipAddress: { ipAddressHeaders: [CLIENT_ADDRESS_HEADER] },
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
