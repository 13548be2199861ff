import "server-only";
// Every e-mail goes through the resend SDK. Without a real key the SDK is
// pointed at the app's own fake of the Resend API, which keeps each message
// in an outbox page; the switch is configuration only.
import { render } from "@react-email/render";
import type { ReactElement } from "react";
import { Resend } from "resend";
import { devFakeKey } from "@/lib/dev-fakes";
import { appUrl, emailDisabled, env, usingFakeEmail } from "@/lib/env";

export function fakeResendBaseUrl() {
  return `${appUrl()}/api/fake/resend`;
}

let client: Resend | undefined;

function resend() {
  if (!client) {
    const e = env();
    client = usingFakeEmail()
      ? new Resend(devFakeKey("resend"), { baseUrl: fakeResendBaseUrl() })
      : new Resend(e.RESEND_API_KEY, e.RESEND_BASE_URL ? { baseUrl: e.RESEND_BASE_URL } : undefined);
  }
  return client;
}

export type EmailKind =
  | "welcome"
  | "verify-email"
  | "sign-up-attempt"
  | "password-reset"
  | "invitation"
  | "reminder-digest"
  | "pass-received"
  | "pass-ended"
  | "shop-entry"
  | "plus-receipt"
  | "plus-payment-failed"
  | "keeper-invitation"
  | "hand-on";

export type SendEmailInput = {
  to: string | string[];
  subject: string;
  react: ReactElement;
  kind: EmailKind;
  /** Per-kind unsubscribe link, added as a List-Unsubscribe header. */
  unsubscribeUrl?: string;
  /** The same key on a retry makes the provider treat it as the same message. */
  idempotencyKey?: string;
};

export type SendEmailResult = { ok: true; id: string } | { ok: false; error: string };

export async function sendEmail(input: SendEmailInput): Promise<SendEmailResult> {
  // The seed script runs with no server to receive the fake's messages.
  if (process.env.FOURPATCH_EMAIL_DELIVERY === "skip") return { ok: false, error: "E-mail delivery is switched off." };
  // No real key and no fakes: send nothing rather than keep a readable copy anywhere.
  if (emailDisabled()) {
    console.warn(`Fourpatch: e-mail (${input.kind}) not sent: set RESEND_API_KEY, or FOURPATCH_DEV_FAKES=on for the local outbox.`);
    return { ok: false, error: "E-mail is not configured." };
  }
  const [html, text] = await Promise.all([render(input.react), render(input.react, { plainText: true })]);
  const headers: Record<string, string> = {};
  if (input.unsubscribeUrl) {
    headers["List-Unsubscribe"] = `<${input.unsubscribeUrl}>`;
    headers["List-Unsubscribe-Post"] = "List-Unsubscribe=One-Click";
  }
  const { data, error } = await resend().emails.send({
    from: env().EMAIL_FROM,
    to: Array.isArray(input.to) ? input.to : [input.to],
    subject: input.subject,
    html,
    text,
    headers,
    tags: [{ name: "kind", value: input.kind }],
  }, input.idempotencyKey ? { idempotencyKey: input.idempotencyKey } : undefined);
  if (error || !data) return { ok: false, error: error?.message ?? "The e-mail service gave no answer." };
  return { ok: true, id: data.id };
}

/**
 * Sends without making the caller wait: for answers that must take the same
 * time whether or not an address has an account (sign-up, reset). A failure
 * is logged, never thrown.
 */
export function sendEmailInBackground(input: SendEmailInput): void {
  void sendEmail(input).catch((err: unknown) => console.error(err));
}

/** Only for tests: drop the cached SDK client after changing the environment. */
export function resetEmailClientForTests() {
  client = undefined;
}
