import { z } from "zod";

// Environment, validated once. Empty strings count as unset so that a
// `FOO=` line in a .env file does not switch a service on by accident.
const blankToUndefined = (v: unknown) => (typeof v === "string" && v.trim() === "" ? undefined : v);
const optional = () => z.preprocess(blankToUndefined, z.string().optional());

const schema = z.object({
  NODE_ENV: z.enum(["development", "production", "test"]).default("development"),
  // Where PGlite keeps its files; `memory://` for an in-memory database.
  FOURPATCH_DATA_DIR: z.preprocess(blankToUndefined, z.string().default("./data")),
  // Where PGlite's WebAssembly runs: in a worker thread (default), so that a
  // heavy query never freezes the request thread, or in the server's own thread.
  FOURPATCH_PGLITE_THREAD: z.preprocess(blankToUndefined, z.enum(["worker", "main"]).default("worker")),
  FOURPATCH_PGLITE_BUFFERS_MB: z.preprocess(blankToUndefined, z.coerce.number().int().min(8).max(1024).default(32)),
  // When set, a real PostgreSQL server is used instead of PGlite.
  DATABASE_URL: optional(),
  BETTER_AUTH_SECRET: optional(),
  BETTER_AUTH_URL: optional(),
  // Real e-mail when set; otherwise the local fake keeps every message.
  RESEND_API_KEY: optional(),
  RESEND_BASE_URL: optional(),
  EMAIL_FROM: z.preprocess(blankToUndefined, z.string().default("Fourpatch <reminders@fourpatch.test>")),
  STRIPE_SECRET_KEY: optional(),
  STRIPE_WEBHOOK_SECRET: optional(),
  CRON_SECRET: optional(),
});

export type Env = z.infer<typeof schema>;

let cached: Env | undefined;

export function env(): Env {
  if (!cached) {
    const parsed = schema.safeParse(process.env);
    if (!parsed.success) {
      const lines = parsed.error.issues.map((i) => `  ${i.path.join(".")}: ${i.message}`).join("\n");
      throw new Error(`Fourpatch: invalid environment\n${lines}`);
    }
    cached = parsed.data;
  }
  return cached;
}

/** The public address of the app, used in links of e-mails and feeds. */
export function appUrl(): string {
  const e = env();
  return (e.BETTER_AUTH_URL ?? `http://localhost:${process.env.PORT ?? 3000}`).replace(/\/$/, "");
}

/** True while the local fake stands in for e-mail: no real key, and fakes switched on explicitly (lib/dev-fakes.ts). */
export function usingFakeEmail(): boolean {
  return !env().RESEND_API_KEY && process.env.FOURPATCH_DEV_FAKES === "on";
}

/** Neither a real e-mail key nor the fakes: nothing is sent (a production server refuses to start). */
export function emailDisabled(): boolean {
  return !env().RESEND_API_KEY && process.env.FOURPATCH_DEV_FAKES !== "on";
}

/** True while the local fake stands in for Stripe: no real key, and fakes switched on explicitly (lib/dev-fakes.ts). */
export function usingFakeStripe(): boolean {
  return !env().STRIPE_SECRET_KEY && process.env.FOURPATCH_DEV_FAKES === "on";
}

/** Only for tests: forget the parsed environment after changing process.env. */
export function resetEnvForTests() {
  cached = undefined;
}
