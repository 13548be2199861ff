/**
 * Bad input is a value, never an exception: screens show `error` as is, so it
 * must be a sentence a driver understands; `code` is for programs.
 */
export type Failure<C extends string = string> = { ok: false; error: string; code: C };
export type Result<T, C extends string = string> = ({ ok: true } & T) | Failure<C>;

export function fail<C extends string>(code: C, error: string): Failure<C> {
  return { ok: false, error, code };
}

/** Shown wherever the core judges a tire (condition, limit, advice). */
export const CAUTION =
  "These figures are guidance only: local law and a qualified tire technician decide whether a tire is fit for the road.";
