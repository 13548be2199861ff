"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import Link from "next/link";
import { useRouter, useSearchParams } from "next/navigation";
import { useState } from "react";
import { useForm, type FieldValues, type Path } from "react-hook-form";
import type { z } from "zod";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Field, Input } from "@/components/ui/field";
import { authClient } from "@/lib/auth/client";
import { forgotPasswordSchema, resetPasswordSchema, signInSchema, signUpSchema } from "@/lib/validation/auth";

type FieldSpec<T> = { name: Path<T & FieldValues>; label: string; type: string; autoComplete: string; hint?: string };

function useSafeNext() {
  const next = useSearchParams().get("next");
  // Only same-site paths, so the parameter cannot send anyone elsewhere.
  return next && next.startsWith("/") && !next.startsWith("//") ? next : "/start";
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

export function SignInForm() {
  const router = useRouter();
  const next = useSafeNext();
  const justReset = useSearchParams().get("reset") === "1";
  const [error, setError] = useState<string | null>(null);
  const form = useForm<z.infer<typeof signInSchema>>({ resolver: zodResolver(signInSchema) });
  return (
    <form
      noValidate
      className="space-y-4"
      onSubmit={form.handleSubmit(async (values) => {
        setError(null);
        const { error } = await authClient.signIn.email(values);
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
        <Link href="/forgot-password" className="text-groove-800">Forgot your password?</Link>
        <Link href="/sign-up" className="text-groove-800">Create an account</Link>
      </div>
    </form>
  );
}

export function SignUpForm() {
  const router = useRouter();
  // An invitation or hand-on link sends people here with ?next= to come back to it.
  const next = useSafeNext();
  const [error, setError] = useState<string | null>(null);
  const form = useForm<z.infer<typeof signUpSchema>>({ resolver: zodResolver(signUpSchema) });
  return (
    <form
      noValidate
      className="space-y-4"
      onSubmit={form.handleSubmit(async (values) => {
        setError(null);
        const { error } = await authClient.signUp.email(values);
        if (error) {
          setError(
            error.code === "USER_ALREADY_EXISTS" || error.status === 422
              ? "An account with this e-mail already exists. Sign in instead, or reset its password."
              : (error.message ?? "Could not create the account. Please try again."),
          );
          return;
        }
        router.push(next === "/start" ? "/vehicles" : next);
        router.refresh();
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
        Already have an account? <Link href="/sign-in" className="text-groove-800">Sign in</Link>
      </p>
    </form>
  );
}

export function ForgotPasswordForm() {
  const [sent, setSent] = useState(false);
  const form = useForm<z.infer<typeof forgotPasswordSchema>>({ resolver: zodResolver(forgotPasswordSchema) });
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
  const [error, setError] = useState<string | null>(params.get("error") ? "This reset link has expired or was already used. Ask for a new one." : null);
  const form = useForm<z.infer<typeof resetPasswordSchema>>({ resolver: zodResolver(resetPasswordSchema) });
  if (!token)
    return (
      <Alert tone="error">
        This reset link is incomplete or has expired. <Link href="/forgot-password">Ask for a new one.</Link>
      </Alert>
    );
  return (
    <form
      noValidate
      className="space-y-4"
      onSubmit={form.handleSubmit(async ({ password }) => {
        setError(null);
        const { error } = await authClient.resetPassword({ newPassword: password, token });
        if (error) {
          setError("This reset link has expired or was already used. Ask for a new one.");
          return;
        }
        router.push("/sign-in?reset=1");
      })}
    >
      {error ? <Alert tone="error">{error}</Alert> : null}
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
