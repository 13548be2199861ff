// Outside text is hostile. These checks run once for every JSON body, query
// string, path segment and server-action input (lib/api/handler.ts,
// lib/actions.ts), so no field can forget them: a NUL or another control
// character never reaches the database, and the answer names the field.

/** C0 controls except tab, line feed and carriage return; DEL; C1 controls; lone surrogates; U+FFFE/U+FFFF. */
const HOSTILE = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F-\u009F\uFFFE\uFFFF]|\p{Cs}/u;
/** Single-line text (names, e-mail subjects) also refuses line and paragraph breaks. */
const BREAKS = /[\r\n\u2028\u2029\u0085]/;

const MAX_TEXT_DEPTH = 32;

export const HOSTILE_TEXT_MESSAGE = "Remove the control characters from this field.";

export function hasHostileText(s: string): boolean {
  return HOSTILE.test(s);
}

export function isSingleLine(s: string): boolean {
  return !BREAKS.test(s) && !HOSTILE.test(s);
}

/** The first path (a.b.0.c) in a JSON value whose key or string holds hostile characters, or null. */
export function findHostileText(value: unknown, path: string[] = []): string | null {
  // Nesting past any form's shape is refused as such (and never recursed into).
  if (path.length > MAX_TEXT_DEPTH) return "_form";
  if (typeof value === "string") return hasHostileText(value) ? path.join(".") || "_form" : null;
  if (Array.isArray(value)) {
    for (let i = 0; i < value.length; i++) {
      const p = findHostileText(value[i], [...path, String(i)]);
      if (p !== null) return p;
    }
    return null;
  }
  if (value && typeof value === "object") {
    for (const [k, v] of Object.entries(value)) {
      if (hasHostileText(k)) return [...path, "_key"].join(".");
      const p = findHostileText(v, [...path, k]);
      if (p !== null) return p;
    }
  }
  return null;
}

/** Nesting depth of a JSON value (a scalar is 0). */
export function jsonDepth(value: unknown, limit = 64): number {
  let max = 0;
  const stack: [unknown, number][] = [[value, 0]];
  while (stack.length) {
    const [v, d] = stack.pop()!;
    if (d > max) max = d;
    if (max > limit) return max;
    if (v && typeof v === "object") for (const child of Object.values(v)) stack.push([child, d + 1]);
  }
  return max;
}

/**
 * A number typed as text: plain decimal notation only (a comma may stand for
 * the point). `Number()` alone would also take "0x1F", "1e3", "Infinity" and
 * "" — hex and exponents are not how anyone writes a tread depth.
 */
const DECIMAL = /^[+-]?(\d+([.,]\d*)?|[.,]\d+)$/;

export function decimalFromText(v: unknown): unknown {
  if (typeof v !== "string") return v;
  const t = v.trim();
  if (t === "") return undefined;
  if (!DECIMAL.test(t)) return Number.NaN;
  return Number(t.replace(",", "."));
}
