"use client";
import { linkClass } from "@/components/logbook/format";
import Link from "next/link";
import { useRouter, useSearchParams } from "next/navigation";
import { useState } from "react";
import { useForm, type FieldValues, type Path } from "react-hook-form";
import type { z } from "zod";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Field, Input } from "@/components/ui/field";
import { authClient } from "@/lib/auth/client";
import { safeNextPath } from "@/lib/safe-next";
import type { forgotPasswordSchema, resetPasswordSchema, signInSchema, signUpSchema } from "@/lib/validation/auth";
import { lazyZodResolver } from "@/lib/forms/lazy-zod-resolver";

// The schemas (and zod) load on a form's first check.
const signInResolver = lazyZodResolver(() => import("@/lib/validation/auth").then((m) => m.signInSchema));
const signUpResolver = lazyZodResolver(() => import("@/lib/validation/auth").then((m) => m.signUpSchema));
const forgotResolver = lazyZodResolver(() => import("@/lib/validation/auth").then((m) => m.forgotPasswordSchema));
const resetResolver = lazyZodResolver(() => import("@/lib/validation/auth").then((m) => m.resetPasswordSchema));

type FieldSpec<T> = { name: Path<T & FieldValues>; label: string; type: string; autoComplete: string; hint?: string };

function useSafeNext() {
  const next = useSearchParams().get("next");
  // Only paths of this app, so the parameter cannot send anyone elsewhere (lib/safe-next.ts).
  return safeNextPath(next, typeof window === "undefined" ? "http://localhost" : window.location.origin);
}

function FormFields<T extends FieldValues>({ form, fields }: { form: ReturnType<typeof useForm<T>>; fields: FieldSpec<T>[] }) {
  return (
    <>
      {fields.map((f) => (
        <Field key={f.name} label={f.label} hint={f.hint} error={form.formState.errors[f.name]?.message as string | undefined}>
          {({ id, describedBy, invalid }) => (
            <Input
              id={id}
              type={f.type}
              autoComplete={f.autoComplete}
              aria-describedby={describedBy}
              aria-invalid={invalid}
              {...form.register(f.name)}
            />
          )}
        </Field>
      ))}
    </>
  );
}

/** Where the link in the verification e-mail leads: back here, signed in, then on to `next` (app/(auth)/sign-in/page.tsx). */
export function verifiedCallback(next: string) {
  return `/sign-in?verified=1&next=${encodeURIComponent(next)}`;
}

function ResendVerification({ email, next }: { email: string; next: string }) {
  const [state, setState] = useState<"idle" | "sending" | "sent">("idle");
  return (
    <Alert tone="error" title="Confirm your e-mail address first">
      <p>Open the link we sent to {email} to finish creating your account.</p>
      {state === "sent" ? (
        <p role="status" className="mt-2 font-medium">A new link is on its way. It works for 24 hours.</p>
      ) : (
        <Button
          type="button"
          variant="secondary"
          size="sm"
          className="mt-2"
          pending={state === "sending"}
          pendingLabel="Sending…"
          onClick={async () => {
            setState("sending");
            await authClient.sendVerificationEmail({ email, callbackURL: verifiedCallback(next) });
            setState("sent");
          }}
        >
          Send the link again
        </Button>
      )}
    </Alert>
  );
}

export function SignInForm() {
  const router = useRouter();
  const next = useSafeNext();
  const params = useSearchParams();
  const justReset = params.get("reset") === "1";
  // The verification link came back with an error (expired, used or altered).
  const badLink = params.get("verified") === "1" && !!params.get("error");
  const [error, setError] = useState<string | null>(null);
  const [unverified, setUnverified] = useState<string | null>(null);
  const form = useForm<z.infer<typeof signInSchema>>({ resolver: signInResolver });
  return (
    <form
      noValidate
      className="space-y-4"
      onSubmit={form.handleSubmit(async (values) => {
        setError(null);
        setUnverified(null);
        const { error } = await authClient.signIn.email(values);
        if (error?.status === 403 && error.code === "EMAIL_NOT_VERIFIED") {
          setUnverified(values.email);
          return;
        }
        if (error) {
          setError(
            error.status === 429
              ? "Too many attempts. Wait a minute and try again."
              : error.status === 403 && error.code === "BANNED_USER"
                ? "This account is disabled. Write to the Fourpatch operators if you think this is a mistake."
                : "That e-mail and password do not match an account.",
          );
          return;
        }
        router.push(next);
        router.refresh();
      })}
    >
      {error ? <Alert tone="error">{error}</Alert> : null}
      {unverified ? <ResendVerification email={unverified} next={next} /> : null}
      {badLink && !error && !unverified ? (
        <Alert tone="error">This confirmation link has expired or was already used. Sign in to get a new one.</Alert>
      ) : null}
      {justReset && !error ? <Alert tone="success">Your new password is saved. Sign in with it.</Alert> : null}
      <FormFields
        form={form}
        fields={[
          { name: "email", label: "E-mail", type: "email", autoComplete: "email" },
          { name: "password", label: "Password", type: "password", autoComplete: "current-password" },
        ]}
      />
      <Button type="submit" className="w-full" pending={form.formState.isSubmitting} pendingLabel="Signing in…">
        Sign in
      </Button>
      <div className="flex justify-between text-sm">
        <Link href="/forgot-password" className={linkClass}>Forgot your password?</Link>
        <Link href={next === "/start" ? "/sign-up" : `/sign-up?next=${encodeURIComponent(next)}`} className={linkClass}>Create an account</Link>
      </div>
    </form>
  );
}

export function SignUpForm() {
  // An invitation, a hand-on link (or any page) that sent the visitor here gets them back after sign-up.
  const next = useSafeNext();
  const back = next === "/start" ? null : next;
  const [error, setError] = useState<string | null>(null);
  const [sentTo, setSentTo] = useState<string | null>(null);
  const form = useForm<z.infer<typeof signUpSchema>>({ resolver: signUpResolver });
  // The same answer whether or not the address already has an account: its
  // owner gets an e-mail about the attempt instead (lib/auth/server.ts).
  if (sentTo)
    return (
      <Alert tone="success" title="Check your inbox">
        We sent a link to {sentTo}. Open it to finish creating your logbook; it works for 24 hours. Nothing arrived?
        Look in the spam folder, or <Link href={back ? `/sign-in?next=${encodeURIComponent(back)}` : "/sign-in"} className={linkClass}>sign in</Link> to have it sent again.
      </Alert>
    );
  return (
    <form
      noValidate
      className="space-y-4"
      onSubmit={form.handleSubmit(async (values) => {
        setError(null);
        const { error } = await authClient.signUp.email({ ...values, callbackURL: verifiedCallback(back ?? "/vehicles") });
        if (error) {
          setError(error.status === 429 ? "Too many attempts. Wait a minute and try again." : (error.message ?? "Could not create the account. Please try again."));
          return;
        }
        setSentTo(values.email);
      })}
    >
      {error ? <Alert tone="error">{error}</Alert> : null}
      <FormFields
        form={form}
        fields={[
          { name: "name", label: "Your name", type: "text", autoComplete: "name" },
          { name: "email", label: "E-mail", type: "email", autoComplete: "email" },
          { name: "password", label: "Password", type: "password", autoComplete: "new-password", hint: "At least 10 characters." },
        ]}
      />
      <Button type="submit" className="w-full" pending={form.formState.isSubmitting} pendingLabel="Creating your logbook…">
        Create my logbook
      </Button>
      <p className="text-sm">
        Already have an account?{" "}
        <Link href={back ? `/sign-in?next=${encodeURIComponent(back)}` : "/sign-in"} className={linkClass}>
          Sign in
        </Link>
      </p>
    </form>
  );
}

export function ForgotPasswordForm() {
  const [sent, setSent] = useState(false);
  const form = useForm<z.infer<typeof forgotPasswordSchema>>({ resolver: forgotResolver });
  if (sent)
    return (
      <Alert tone="success" title="Check your inbox">
        If an account uses that address, a link to choose a new password is on its way. It works for one hour.
      </Alert>
    );
  return (
    <form
      noValidate
      className="space-y-4"
      onSubmit={form.handleSubmit(async ({ email }) => {
        // The answer is the same whether or not the account exists.
        await authClient.requestPasswordReset({ email, redirectTo: "/reset-password" });
        setSent(true);
      })}
    >
      <FormFields form={form} fields={[{ name: "email", label: "E-mail", type: "email", autoComplete: "email" }]} />
      <Button type="submit" className="w-full" pending={form.formState.isSubmitting} pendingLabel="Sending…">
        Send me a reset link
      </Button>
    </form>
  );
}

export function ResetPasswordForm() {
  const router = useRouter();
  const params = useSearchParams();
  const token = params.get("token");
  const [expired, setExpired] = useState(!!params.get("error"));
  const form = useForm<z.infer<typeof resetPasswordSchema>>({ resolver: resetResolver });
  if (!token)
    return (
      <Alert tone="error">
        This reset link is incomplete or has expired.{" "}
        <Link href="/forgot-password" className={linkClass}>
          Send me a new link
        </Link>
        .
      </Alert>
    );
  return (
    <form
      noValidate
      className="space-y-4"
      onSubmit={form.handleSubmit(async ({ password }) => {
        setExpired(false);
        const { error } = await authClient.resetPassword({ newPassword: password, token });
        if (error) {
          setExpired(true);
          return;
        }
        router.push("/sign-in?reset=1");
      })}
    >
      {expired ? (
        <Alert tone="error">
          This reset link has expired or was already used.{" "}
          <Link href="/forgot-password" className={linkClass}>
            Send me a new link
          </Link>
          .
        </Alert>
      ) : null}
      <FormFields
        form={form}
        fields={[
          { name: "password", label: "New password", type: "password", autoComplete: "new-password", hint: "At least 10 characters." },
          { name: "confirm", label: "New password again", type: "password", autoComplete: "new-password" },
        ]}
      />
      <Button type="submit" className="w-full" pending={form.formState.isSubmitting} pendingLabel="Saving…">
        Save the new password
      </Button>
    </form>
  );
}
