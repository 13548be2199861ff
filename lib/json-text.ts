// The JSON of an object that may be served many times (the answers
// db/revision.ts keeps): encoded once per object, as UTF-8 bytes, then
// reused, so sizing an answer for the cache and sending it cost one
// JSON.stringify and one encoding between them. (Encoding a logbook's
// two-byte JSON string again on every request was ~0.1–0.35 ms of the
// request thread, in a CPU profile under load.)
const kept = new WeakMap<object, Uint8Array>();

function encode(value: unknown): Uint8Array {
  return Buffer.from(JSON.stringify(value) ?? "null", "utf8");
}

/** The value's JSON as UTF-8 bytes, made once per object. Do not change the array: see `jsonBody`. */
export function jsonBytes(value: unknown): Uint8Array {
  if (value === null || typeof value !== "object") return encode(value);
  let bytes = kept.get(value);
  if (bytes === undefined) {
    bytes = encode(value);
    kept.set(value, bytes);
  }
  return bytes;
}

/**
 * A response body of the value's JSON: a copy of the kept bytes, since a
 * response stream may take over (detach) the buffer it is given.
 */
export function jsonBody(value: unknown): Uint8Array<ArrayBuffer> {
  return new Uint8Array(jsonBytes(value));
}
