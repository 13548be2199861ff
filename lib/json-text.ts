// The JSON text of an object that may be served many times (the answers
// db/revision.ts keeps): made once per object, then reused, so sizing an
// answer for the cache and sending it cost one JSON.stringify between them.
const texts = new WeakMap<object, string>();

export function jsonText(value: unknown): string {
  if (value === null || typeof value !== "object") return JSON.stringify(value) ?? "null";
  let text = texts.get(value);
  if (text === undefined) {
    text = JSON.stringify(value);
    texts.set(value, text);
  }
  return text;
}
