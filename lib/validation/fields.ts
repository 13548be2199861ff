import type { z } from "zod";
import type { FieldErrors } from "@/lib/errors";

/** zod issues → `{ "tires.0.dotCode": ["…"] }`, the shape forms display. */
export function fieldErrors(error: z.ZodError): FieldErrors {
  const out: FieldErrors = {};
  for (const issue of error.issues) {
    const key = issue.path.map(String).join(".") || "_form";
    (out[key] ??= []).push(issue.message);
  }
  return out;
}
