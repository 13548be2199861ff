// Decodes the SDK's form encoding (`a[b][0][c]=v`, qs's indexed format) into
// nested objects and arrays. Hostile input is bounded: at most 200 pairs,
// keys of at most 8 levels, indexes below 100.
export class FormError extends Error {
  constructor(readonly param: string, message: string) {
    super(message);
  }
}

type Node = Record<string, unknown>;

export function parseStripeForm(body: string | URLSearchParams): Record<string, unknown> {
  const params = typeof body === "string" ? new URLSearchParams(body) : body;
  const root: Node = {};
  let count = 0;
  for (const [key, value] of params) {
    if (++count > 200) throw new FormError(key, "Too many parameters.");
    const m = /^([^[\]]+)((?:\[[^[\]]*\])*)$/.exec(key);
    if (!m) throw new FormError(key, `Invalid parameter name: ${key}`);
    const path = [m[1]!, ...[...m[2]!.matchAll(/\[([^[\]]*)\]/g)].map((x) => x[1]!)];
    if (path.length > 8) throw new FormError(key, `Parameter nested too deeply: ${key}`);
    let node: Node = root;
    for (let i = 0; i < path.length - 1; i++) {
      const seg = path[i]!;
      if (seg === "__proto__" || seg === "constructor" || seg === "prototype") throw new FormError(key, `Invalid parameter name: ${key}`);
      const next = node[seg];
      if (next === undefined) node[seg] = {};
      else if (typeof next !== "object" || next === null) throw new FormError(key, `Invalid parameter: ${key}`);
      node = node[seg] as Node;
    }
    const last = path[path.length - 1]!;
    if (last === "__proto__" || last === "constructor" || last === "prototype") throw new FormError(key, `Invalid parameter name: ${key}`);
    node[last] = value;
  }
  return arrays(root) as Record<string, unknown>;
}

// Objects whose keys are exactly 0..n-1 become arrays.
function arrays(v: unknown): unknown {
  if (typeof v !== "object" || v === null) return v;
  const o = v as Node;
  const keys = Object.keys(o);
  const converted: Node = Object.create(null);
  for (const k of keys) converted[k] = arrays(o[k]);
  if (keys.length > 0 && keys.every((k) => /^\d{1,2}$/.test(k))) {
    const idx = keys.map(Number).sort((a, b) => a - b);
    if (idx.every((n, i) => n === i)) return idx.map((i) => converted[String(i)]);
  }
  return { ...converted };
}
