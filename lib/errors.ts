// One error type for the whole app. Its code decides the HTTP status and
// whether its message may be shown to the person who made the request.
export type ErrorCode =
  | "unauthenticated"
  | "forbidden"
  | "not_found"
  | "invalid"
  | "conflict"
  | "too_large"
  | "unsupported_type"
  | "rate_limited"
  | "pass_ended"
  | "payment_required"
  | "internal";

const status: Record<ErrorCode, number> = {
  unauthenticated: 401,
  forbidden: 403,
  not_found: 404,
  invalid: 422,
  conflict: 409,
  too_large: 413,
  unsupported_type: 415,
  rate_limited: 429,
  pass_ended: 403,
  payment_required: 402,
  internal: 500,
};

export type FieldErrors = Record<string, string[]>;

export class AppError extends Error {
  constructor(
    readonly code: ErrorCode,
    message: string,
    readonly fields?: FieldErrors,
  ) {
    super(message);
    this.name = "AppError";
  }
  get status() {
    return status[this.code];
  }
  /** Internal errors keep their details in the server log only. */
  get safeMessage() {
    return this.code === "internal" ? "Something went wrong on our side. Nothing was saved; please try again." : this.message;
  }
}

export const notFound = (what = "That item") => new AppError("not_found", `${what} was not found.`);
export const unauthenticated = () => new AppError("unauthenticated", "Please sign in first.");
export const forbidden = (message = "This account cannot do that.") => new AppError("forbidden", message);

export function toAppError(err: unknown): AppError {
  if (err instanceof AppError) return err;
  console.error(err);
  return new AppError("internal", err instanceof Error ? err.message : String(err));
}

/** The JSON body every API error has. */
export type ApiErrorBody = { error: { code: ErrorCode; message: string; fields?: FieldErrors; upgradeUrl?: string } };

/** Where a Free driver buys Plus; every 402 names it. */
export const UPGRADE_PATH = "/account/billing";

/** A Plus-only feature asked for on Free: 402 with the upgrade link. */
export const plusRequired = (what: string, fields?: FieldErrors) =>
  new AppError("payment_required", `${what} ${what.endsWith("s") ? "are" : "is"} part of Plus. Upgrade on ${UPGRADE_PATH}.`, fields);

export function errorBody(err: AppError, baseUrl?: string): ApiErrorBody {
  return {
    error: {
      code: err.code,
      message: err.safeMessage,
      ...(err.fields ? { fields: err.fields } : {}),
      ...(err.code === "payment_required" ? { upgradeUrl: `${baseUrl ?? ""}${UPGRADE_PATH}` } : {}),
    },
  };
}
