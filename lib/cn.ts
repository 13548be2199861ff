// `cn`: class names joined (clsx), a later utility replacing an earlier one of
// the same kind, so a caller's `className` overrides a component's default
// (`p-0` over `p-4`, `text-xs` over `text-sm`). tailwind-merge did this with
// rules for all of Tailwind, ~9 KiB of every page's first-load JS; this knows
// the kinds of utility the app uses. tests/unit/visual/cn.test.ts checks it
// against tailwind-merge for every pair of classes in the source, so a class
// it does not know fails there rather than merging wrongly on a page.
import { clsx, type ClassValue } from "clsx";

const LENGTH = /^\[(?:-?[\d.]+(?:px|r?em|%|[dsl]?v[hw]|pt|pc|cm|mm|in|ch|ex|r?lh|vmin|vmax)|(?:calc|min|max|clamp)\(.*\)|length:.*)\]$/;
const SPACE = /^(?:\d+(?:\.\d+)?|\d+\/\d+|px|auto|full|screen|min|max|fit|[dsl]v[hw]|lh|\[.+\]|\(.+\))$/;
const NUM = /^(?:\d+|auto|\[.+\])$/;
const INT = /^\d+$/;
const STYLE = /^(?:solid|dashed|dotted|double|hidden|none)$/;
const ANY = /./;

// Utility kinds by prefix: [prefixes, the value they take, the kind (the prefix when left out)].
const RULES: [string, RegExp, string?][] = [
  ["p px py pt pr pb pl ps pe m mx my mt mr mb ml ms me w h size top right bottom left basis inset inset-x inset-y gap gap-x gap-y", SPACE],
  ["min-w min-h", SPACE],
  ["max-w", /^(?:\d+|\d?xs|sm|md|lg|\d?xl|\[.+\])$/],
  ["z opacity col-start row-start", NUM],
  ["space-y scroll-mt grid-cols grid-flow auto-cols underline-offset overflow-x translate-x translate-y leading tracking whitespace cursor accent animate transition from to", ANY],
  ["col-span", NUM, "col-start-end"],
  ["row-span", NUM, "row-start-end"],
  ["flex", /^(?:row|col)(?:-reverse)?$/, "flex-direction"],
  ["flex", /^(?:wrap|nowrap|wrap-reverse)$/, "flex-wrap"],
  ["flex", NUM],
  ["shrink", INT],
  ["items", /^(?:start|end|center|baseline)$/, "align-items"],
  ["justify", /^(?:end|center|between)$/, "justify-content"],
  ["self", /^center$/, "align-self"],
  ["align", /^top$/, "vertical-align"],
  ["text", /^(?:left|center|right)$/, "text-alignment"],
  ["text", /^(?:\d?xs|sm|base|lg|\d?xl)$/, "font-size"],
  ["text", LENGTH, "font-size"],
  ["text", ANY, "text-color"],
  ["font", /^(?:thin|extralight|light|normal|medium|semibold|bold|extrabold|black|\d+)$/, "font-weight"],
  ["font", ANY, "font-family"],
  ["break", /^(?:words|all)$/],
  ["list", /^disc$/],
  ["decoration bg", ANY],
  ["border", INT, "border-w"],
  ["border", STYLE, "border-style"],
  ["border", ANY, "border-color"],
  ["divide", ANY, "divide-color"],
  ["rounded", ANY],
  ["shadow", /^(?:lg|xl)$/],
  ["shadow", ANY, "shadow-color"],
  ["ring", INT, "ring-w"],
  ["ring", ANY, "ring-color"],
  ["outline", /^none$/, "outline-style"],
  ["outline", INT, "outline-w"],
  ["overflow", /^auto$/],
  ["pointer-events", /^none$/],
  ["border-t", INT, "border-w-t"],
  ["border-b", INT, "border-w-b"],
];

/** Utilities without a value. */
const EXACT = new Map<string, string>();
for (const [k, list] of Object.entries({
  display: "block inline-block inline flex inline-flex grid hidden contents table table-cell",
  position: "static fixed absolute relative sticky",
  sr: "sr-only",
  "not-sr": "not-sr-only",
  "text-overflow": "truncate",
  "text-decoration": "underline no-underline",
  "text-transform": "uppercase",
  "fvn-spacing": "tabular-nums",
  "border-collapse": "border-collapse",
  "border-w": "border",
  "border-w-t": "border-t",
  "border-w-b": "border-b",
  "ring-w": "ring",
  "outline-w": "outline",
  "backdrop-blur": "backdrop-blur",
  "divide-y": "divide-y",
  rounded: "rounded",
  shrink: "shrink",
  "transition-colors": "transition",
})) for (const u of list.split(" ")) EXACT.set(u, k);

const BY_PREFIX = new Map<string, [RegExp, string | undefined][]>();
for (const [prefixes, test, kind] of RULES) {
  for (const prefix of prefixes.split(" ")) BY_PREFIX.set(prefix, [...(BY_PREFIX.get(prefix) ?? []), [test, kind]]);
}

/** The kind of a utility (without its variants), or undefined for a class this does not know. */
function kind(u: string): string | undefined {
  if (u.startsWith("-")) u = u.slice(1);
  if (EXACT.has(u)) return EXACT.get(u);
  // The longest known prefix first: `inset-x-0` is inset-x before it is inset.
  for (let dash = u.lastIndexOf("-"); dash > 0; dash = u.lastIndexOf("-", dash - 1)) {
    const prefix = u.slice(0, dash);
    const value = u.slice(dash + 1);
    for (const [test, k] of BY_PREFIX.get(prefix) ?? []) if (value && test.test(value)) return k ?? prefix;
  }
  return undefined;
}

const PAD = ["px", "py", "pt", "pr", "pb", "pl"];
const MAR = ["mx", "my", "mt", "mr", "mb", "ml"];
/** Kinds that a utility of the key's kind also sets: a later one removes earlier ones of these (tailwind-merge's conflicting groups, the part the app needs). */
const CONFLICTS: Record<string, string[]> = {
  overflow: ["overflow-x"],
  inset: ["inset-x", "inset-y", "top", "right", "bottom", "left"],
  "inset-x": ["right", "left"],
  "inset-y": ["top", "bottom"],
  flex: ["shrink"],
  gap: ["gap-x", "gap-y"],
  p: PAD,
  px: ["pr", "pl"],
  py: ["pt", "pb"],
  m: MAR,
  mx: ["mr", "ml"],
  my: ["mt", "mb"],
  size: ["w", "h"],
  // Tailwind emits these after `sr-only`, so an earlier one would undo the hiding.
  sr: ["not-sr", "position", "size", "w", "h", "p", ...PAD, "m", ...MAR, "overflow", "overflow-x", "whitespace"],
  "not-sr": ["sr"],
  "border-w": ["border-w-t", "border-w-b"],
};
/** Variants whose place in the list matters (`before:hover:` is not `hover:before:`). */
const ORDERED = new Set(["*", "**", "after", "backdrop", "before", "details-content", "file", "first-letter", "first-line", "marker", "placeholder", "selection"]);

/** Where the variants end (`sm:hover:`), not counting colons inside brackets. */
function variantEnd(c: string): number {
  let depth = 0;
  let end = -1;
  for (let i = 0; i < c.length; i++) {
    const ch = c[i];
    if (ch === "[" || ch === "(") depth++;
    else if (ch === "]" || ch === ")") depth--;
    else if (ch === ":" && depth === 0) end = i;
  }
  return end;
}

export function cn(...inputs: ClassValue[]): string {
  const classes = clsx(inputs).split(/\s+/).filter(Boolean);
  const taken = new Set<string>();
  const kept: string[] = [];
  for (let i = classes.length - 1; i >= 0; i--) {
    const c = classes[i];
    const end = variantEnd(c);
    // Variants in any order are the same variants, unless one of them picks a part of the element.
    const list = end < 0 ? [] : c.slice(0, end).split(":");
    const variants = list.length ? `${(list.some((v) => ORDERED.has(v)) ? list : list.sort()).join(":")}:` : "";
    let utility = c.slice(end + 1);
    const important = utility.startsWith("!") || utility.endsWith("!");
    utility = utility.replace(/^!|!$/g, "");
    // A colour's opacity (`/30`) or a fraction (`w-1/3`) does not change the kind.
    const slash = utility.lastIndexOf("/");
    const k = kind(utility) ?? (slash > 0 && !utility.slice(slash).includes("]") ? kind(utility.slice(0, slash)) : undefined);
    if (!k) {
      kept.push(c);
      continue;
    }
    const key = `${variants}${important ? "!" : ""}`;
    if (taken.has(key + k)) continue;
    taken.add(key + k);
    for (const other of CONFLICTS[k] ?? []) taken.add(key + other);
    kept.push(c);
  }
  return kept.reverse().join(" ");
}
