// Where to go after sign-in: only a path of this app. The value is parsed
// with URL against the app's own origin (so "/\host", "//host" and
// "https://host" all resolve elsewhere and are refused), and its decoded form
// may hold no control characters or backslashes (browsers drop a tab or a
// line break inside a URL, turning "/%09/host" into "//host").
const UNSAFE = /[\u0000-\u001f\u007f\\]/;

export function safeNextPath(next: string | null | undefined, origin: string, fallback = "/start"): string {
  if (!next || next.length > 2048 || !next.startsWith("/") || UNSAFE.test(next)) return fallback;
  let decoded: string;
  try {
    decoded = decodeURIComponent(next);
  } catch {
    return fallback;
  }
  if (UNSAFE.test(decoded) || decoded.startsWith("//")) return fallback;
  let url: URL;
  try {
    url = new URL(next, origin);
  } catch {
    return fallback;
  }
  if (url.origin !== new URL(origin).origin) return fallback;
  return `${url.pathname}${url.search}${url.hash}`;
}
