import "server-only";
// The viewer's locale and time zone on the server: the zone from the cookie
// the browser sets, the locale from Accept-Language; UTC and en-GB otherwise.
import { cookies, headers } from "next/headers";
import { DEFAULT_PREFS, formatter, localeFromAcceptLanguage, prefsFrom, TIME_ZONE_COOKIE, type FormatPrefs } from "./index";

export async function viewerPrefs(): Promise<FormatPrefs> {
  const [c, h] = await Promise.all([cookies(), headers()]);
  let zone = c.get(TIME_ZONE_COOKIE)?.value ?? null;
  try {
    zone = zone ? decodeURIComponent(zone) : null;
  } catch {
    zone = null;
  }
  return prefsFrom({ locale: localeFromAcceptLanguage(h.get("accept-language")), timeZone: zone });
}

export async function viewerFormat() {
  return formatter(await viewerPrefs());
}

/**
 * The viewer's preferences where a query may run inside a request or not (a
 * message built in db/queries): the request's when there is one, the
 * defaults in a daily job or a test that calls the query directly.
 */
export async function requestPrefs(): Promise<FormatPrefs> {
  try {
    return await viewerPrefs();
  } catch {
    return DEFAULT_PREFS;
  }
}
