// The address of the machine that opened the connection. Next.js gives a
// route handler no socket, and its own `x-forwarded-for` keeps whatever the
// client sent, so neither can be trusted. The server stamps every request
// with the socket's peer, signed with a secret of this process; a header
// without the stamp (sent by a client) counts as no address at all.
import crypto from "node:crypto";
import http from "node:http";

export const PEER_HEADER = "x-fourpatch-peer";

const g = globalThis as unknown as { __fourpatchPeerStamp?: string };

/** Installs the stamp on every HTTP server of this process (instrumentation.ts). */
export function installPeerStamp(): void {
  if (g.__fourpatchPeerStamp) return;
  const stamp = crypto.randomBytes(18).toString("base64url");
  g.__fourpatchPeerStamp = stamp;
  const emit = http.Server.prototype.emit;
  http.Server.prototype.emit = function patchedEmit(this: http.Server, event: string | symbol, ...args: unknown[]) {
    if (event === "request") {
      const req = args[0] as http.IncomingMessage;
      req.headers[PEER_HEADER] = `${stamp} ${req.socket?.remoteAddress ?? ""}`;
    }
    return emit.apply(this, [event, ...args] as Parameters<typeof emit>);
  } as typeof emit;
}

/** Tests that call route handlers directly stamp their requests with this. */
export function peerHeaderForTests(address: string): string {
  g.__fourpatchPeerStamp ??= crypto.randomBytes(18).toString("base64url");
  return `${g.__fourpatchPeerStamp} ${address}`;
}

function normalise(address: string): string {
  const a = address.trim().toLowerCase();
  return a.startsWith("::ffff:") && a.includes(".") ? a.slice(7) : a;
}

/** The socket peer of a request, or null when the request carries no valid stamp. */
export function socketPeer(headers: Headers): string | null {
  const stamp = g.__fourpatchPeerStamp;
  const value = headers.get(PEER_HEADER);
  if (!stamp || !value) return null;
  const space = value.indexOf(" ");
  if (space < 0) return null;
  const given = Buffer.from(value.slice(0, space));
  const expected = Buffer.from(stamp);
  if (given.length !== expected.length || !crypto.timingSafeEqual(given, expected)) return null;
  const address = value.slice(space + 1);
  return address ? normalise(address) : null;
}

/** FOURPATCH_TRUSTED_PROXY: comma-separated addresses of the reverse proxies in front of the app. */
export function trustedProxies(): Set<string> {
  const raw = process.env.FOURPATCH_TRUSTED_PROXY ?? "";
  return new Set(raw.split(",").map((s) => s.trim()).filter(Boolean).map(normalise));
}

/**
 * The client's address: the socket peer, unless that peer is a configured
 * trusted proxy, in which case the right-most `X-Forwarded-For` entry that is
 * not itself a trusted proxy (the one the proxy saw). Null when unknown.
 */
export function clientAddress(headers: Headers): string | null {
  const peer = socketPeer(headers);
  if (!peer) return null;
  const proxies = trustedProxies();
  if (!proxies.has(peer)) return peer;
  const chain = (headers.get("x-forwarded-for") ?? "").split(",").map((s) => normalise(s)).filter(Boolean);
  for (let i = chain.length - 1; i >= 0; i--) if (!proxies.has(chain[i])) return chain[i];
  return peer;
}

export function isLoopback(address: string | null): boolean {
  if (!address) return false;
  const a = normalise(address);
  return a === "::1" || /^127(\.\d{1,3}){3}$/.test(a);
}
