import { z } from "zod";
import { isSingleLine } from "./text";

export const email = z.string().trim().toLowerCase().email("Enter an e-mail address like name@example.com.");
const password = z.string().min(10, "Use at least 10 characters.").max(128, "Use at most 128 characters.");

export const signInSchema = z.object({ email, password: z.string().min(1, "Enter your password.") });
export const signUpSchema = z.object({
  name: z.string().trim().min(1, "Tell us what to call you.").max(80).refine(isSingleLine, "Keep your name on one line."),
  email,
  password,
});
export const forgotPasswordSchema = z.object({ email });
export const resetPasswordSchema = z
  .object({ password, confirm: z.string() })
  .refine((v) => v.password === v.confirm, { path: ["confirm"], message: "The two passwords differ." });

export type SignInInput = z.infer<typeof signInSchema>;
export type SignUpInput = z.infer<typeof signUpSchema>;
