// `cn`: class names joined (clsx), a later utility replacing an earlier one of
// the same kind, so a caller's `className` overrides a component's default
// (`p-0` over `p-4`, `text-xs` over `text-sm`). tailwind-merge did this with
// rules for all of Tailwind, ~9 KiB of every page's first-load JS; this knows
// the kinds of utility the app uses. tests/unit/visual/cn.test.ts checks it
// against tailwind-merge for every pair of classes in the source, so a class
// it does not know fails there rather than merging wrongly on a page.
import { clsx, type ClassValue } from "clsx";

const LENGTH = /^\[(?:-?[\d.]+(?:px|r?em|%|vh|vw|dvh|svh|lvh|pt|pc|cm|mm|in|ch|ex|lh|rlh|vmin|vmax)|(?:calc|min|max|clamp)\(.*\)|length:.*)\]$/;
const SPACE = /^(?:\d+(?:\.\d+)?|\d+\/\d+|px|auto|full|screen|min|max|fit|[dsl]v[hw]|lh|\[.+\]|\(.+\))$/;
const T_SHIRT = /^(?:\d?xs|sm|md|lg|\d?xl|base|none|prose)$/;
const FONT_SIZE = /^(?:\d?xs|sm|base|lg|\d?xl)$/;

/** The kind of a utility (without its variants), or undefined for a class this does not know. */
function kind(u: string): string | undefined {
  if (u.startsWith("-")) u = u.slice(1);
  switch (u) {
    case "block": case "inline-block": case "inline": case "flex": case "inline-flex": case "grid": case "inline-grid": case "hidden": case "contents": case "table": case "table-cell": case "table-row": case "flow-root": case "list-item":
      return "display";
    case "static": case "fixed": case "absolute": case "relative": case "sticky":
      return "position";
    case "sr-only":
      return "sr";
    case "not-sr-only":
      return "not-sr";
    case "truncate": case "text-ellipsis": case "text-clip":
      return "text-overflow";
    case "underline": case "no-underline": case "line-through": case "overline":
      return "text-decoration";
    case "uppercase": case "lowercase": case "capitalize": case "normal-case":
      return "text-transform";
    case "italic": case "not-italic":
      return "font-style";
    case "tabular-nums": case "proportional-nums":
      return "fvn-spacing";
    case "border-collapse": case "border-separate":
      return "border-collapse";
    case "grow": case "shrink":
      return u;
    case "transition":
      return "transition";
    case "rounded":
      return "rounded";
    case "shadow":
      return "shadow";
    case "border":
      return "border-w";
    case "ring":
      return "ring-w";
    case "outline":
      return "outline-w";
    case "blur": case "backdrop-blur":
      return u;
    case "divide-x": case "divide-y":
      return u;
  }
  const dash = u.indexOf("-");
  if (dash < 1 || dash === u.length - 1) return undefined;
  const head = u.slice(0, dash);
  const rest = u.slice(dash + 1);
  const sub = (x: string) => rest.startsWith(`${x}-`) && rest.length > x.length + 1;
  const after = (x: string) => rest.slice(x.length + 1);
  switch (head) {
    case "p": case "px": case "py": case "pt": case "pr": case "pb": case "pl": case "ps": case "pe":
    case "m": case "mx": case "my": case "mt": case "mr": case "mb": case "ml": case "ms": case "me":
    case "w": case "h": case "size": case "top": case "right": case "bottom": case "left": case "basis":
      return SPACE.test(rest) ? head : undefined;
    case "z": case "order": case "opacity":
      return /^(\d+|auto|\[.+\])$/.test(rest) ? head : undefined;
    case "inset":
      return sub("x") ? (SPACE.test(after("x")) ? "inset-x" : undefined) : sub("y") ? (SPACE.test(after("y")) ? "inset-y" : undefined) : SPACE.test(rest) ? "inset" : undefined;
    case "min": case "max":
      return (sub("w") || sub("h")) && (SPACE.test(rest.slice(2)) || T_SHIRT.test(rest.slice(2))) ? `${head}-${rest[0]}` : undefined;
    case "gap":
      return sub("x") ? "gap-x" : sub("y") ? "gap-y" : SPACE.test(rest) ? "gap" : undefined;
    case "space":
      return sub("x") ? "space-x" : sub("y") ? "space-y" : undefined;
    case "scroll":
      return /^(m[trblxyse]?)-/.exec(rest) ? `scroll-${rest.slice(0, rest.indexOf("-"))}` : undefined;
    case "flex":
      return /^(row|col)(-reverse)?$/.test(rest) ? "flex-direction" : /^(wrap|nowrap|wrap-reverse)$/.test(rest) ? "flex-wrap" : /^(\d+|auto|initial|none|\[.+\])$/.test(rest) ? "flex" : undefined;
    case "grow": case "shrink":
      return /^(\d+|\[.+\])$/.test(rest) ? head : undefined;
    case "grid":
      return sub("cols") ? "grid-cols" : sub("rows") ? "grid-rows" : sub("flow") ? "grid-flow" : undefined;
    case "col": case "row":
      return sub("span") ? `${head}-start-end` : sub("start") ? `${head}-start` : sub("end") ? `${head}-end` : undefined;
    case "auto":
      return sub("cols") ? "auto-cols" : sub("rows") ? "auto-rows" : undefined;
    case "items":
      return /^(start|end|center|baseline|stretch)$/.test(rest) ? "align-items" : undefined;
    case "justify":
      return /^(start|end|center|between|around|evenly|stretch|normal)$/.test(rest) ? "justify-content" : undefined;
    case "self":
      return /^(auto|start|end|center|stretch|baseline)$/.test(rest) ? "align-self" : undefined;
    case "align":
      return /^(baseline|top|middle|bottom|text-top|text-bottom|sub|super)$/.test(rest) ? "vertical-align" : undefined;
    case "text":
      if (/^(left|center|right|justify|start|end)$/.test(rest)) return "text-alignment";
      if (/^(wrap|nowrap|balance|pretty)$/.test(rest)) return "text-wrap";
      return FONT_SIZE.test(rest) || LENGTH.test(rest) ? "font-size" : "text-color";
    case "font":
      return /^(thin|extralight|light|normal|medium|semibold|bold|extrabold|black|\d+)$/.test(rest) ? "font-weight" : "font-family";
    case "leading": case "tracking": case "whitespace": case "cursor": case "accent": case "animate": case "transition": case "shadow":
      return head === "shadow" && !T_SHIRT.test(rest) && rest !== "inner" ? "shadow-color" : head;
    case "break":
      return /^(normal|words|all|keep)$/.test(rest) ? "break" : undefined;
    case "list":
      return /^(inside|outside)$/.test(rest) ? "list-style-position" : /^(disc|decimal|none|\[.+\])$/.test(rest) ? "list-style-type" : undefined;
    case "underline":
      return sub("offset") ? "underline-offset" : undefined;
    case "decoration":
      return /^(solid|double|dotted|dashed|wavy)$/.test(rest) ? "text-decoration-style" : /^(auto|from-font|\d+)$/.test(rest) ? "text-decoration-thickness" : "text-decoration-color";
    case "bg":
      return /^(linear|radial|conic)-/.test(rest) || rest === "none" ? "bg-image" : /^(fixed|local|scroll)$/.test(rest) ? "bg-attachment" : /^(auto|cover|contain)$/.test(rest) ? "bg-size" : "bg-color";
    case "from": case "via": case "to":
      return `gradient-${head}`;
    case "border": {
      if (/^\d+$/.test(rest)) return "border-w";
      const side = /^(x|y|t|r|b|l|s|e)(?:-(.+))?$/.exec(rest);
      if (side) return !side[2] || /^\d+$/.test(side[2]) ? `border-w-${side[1]}` : `border-color-${side[1]}`;
      return /^(solid|dashed|dotted|double|hidden|none)$/.test(rest) ? "border-style" : "border-color";
    }
    case "divide":
      return /^[xy]-\d+$/.test(rest) ? `divide-${rest[0]}` : /^(solid|dashed|dotted|double|none)$/.test(rest) ? "divide-style" : "divide-color";
    case "rounded": {
      const side = /^(ss|se|es|ee|tl|tr|br|bl|s|e|t|r|b|l)(-|$)/.exec(rest);
      return side ? `rounded-${side[1]}` : "rounded";
    }
    case "ring":
      return /^\d+$/.test(rest) ? "ring-w" : sub("offset") ? "ring-offset" : "ring-color";
    case "outline":
      return /^(none|hidden|solid|dashed|dotted|double)$/.test(rest) ? "outline-style" : /^\d+$/.test(rest) ? "outline-w" : sub("offset") ? "outline-offset" : "outline-color";
    case "overflow":
      return sub("x") ? "overflow-x" : sub("y") ? "overflow-y" : /^(auto|hidden|clip|visible|scroll)$/.test(rest) ? "overflow" : undefined;
    case "pointer":
      return rest === "events-none" || rest === "events-auto" ? "pointer-events" : undefined;
    case "translate":
      return sub("x") ? "translate-x" : sub("y") ? "translate-y" : undefined;
    case "backdrop":
      return sub("blur") ? "backdrop-blur" : undefined;
  }
  return undefined;
}

const PAD = ["px", "py", "ps", "pe", "pt", "pr", "pb", "pl"];
const MAR = ["mx", "my", "ms", "me", "mt", "mr", "mb", "ml"];
/** Kinds that a utility of the key's kind also sets: a later one removes earlier ones of these (tailwind-merge's conflicting groups, the part the app needs). */
const CONFLICTS: Record<string, string[]> = {
  overflow: ["overflow-x", "overflow-y"],
  inset: ["inset-x", "inset-y", "start", "end", "top", "right", "bottom", "left"],
  "inset-x": ["start", "end", "right", "left"],
  "inset-y": ["top", "bottom"],
  flex: ["basis", "grow", "shrink"],
  gap: ["gap-x", "gap-y"],
  p: PAD,
  px: ["ps", "pe", "pr", "pl"],
  py: ["pt", "pb"],
  m: MAR,
  mx: ["ms", "me", "mr", "ml"],
  my: ["mt", "mb"],
  size: ["w", "h"],
  // Tailwind emits these after `sr-only`, so an earlier one would undo the hiding.
  sr: ["not-sr", "position", "size", "w", "h", "p", ...PAD, "m", ...MAR, "overflow", "overflow-x", "overflow-y", "whitespace"],
  "not-sr": ["sr"],
  rounded: ["rounded-s", "rounded-e", "rounded-t", "rounded-r", "rounded-b", "rounded-l", "rounded-ss", "rounded-se", "rounded-ee", "rounded-es", "rounded-tl", "rounded-tr", "rounded-br", "rounded-bl"],
  "rounded-s": ["rounded-ss", "rounded-es"],
  "rounded-e": ["rounded-se", "rounded-ee"],
  "rounded-t": ["rounded-tl", "rounded-tr"],
  "rounded-r": ["rounded-tr", "rounded-br"],
  "rounded-b": ["rounded-br", "rounded-bl"],
  "rounded-l": ["rounded-tl", "rounded-bl"],
  "border-w": ["border-w-x", "border-w-y", "border-w-s", "border-w-e", "border-w-t", "border-w-r", "border-w-b", "border-w-l"],
  "border-w-x": ["border-w-s", "border-w-e", "border-w-r", "border-w-l"],
  "border-w-y": ["border-w-t", "border-w-b"],
  "border-color": ["border-color-x", "border-color-y", "border-color-s", "border-color-e", "border-color-t", "border-color-r", "border-color-b", "border-color-l"],
  "border-color-x": ["border-color-s", "border-color-e", "border-color-r", "border-color-l"],
  "border-color-y": ["border-color-t", "border-color-b"],
  translate: ["translate-x", "translate-y"],
  "scroll-m": ["scroll-mx", "scroll-my", "scroll-ms", "scroll-me", "scroll-mt", "scroll-mr", "scroll-mb", "scroll-ml"],
  "scroll-mx": ["scroll-ms", "scroll-me", "scroll-mr", "scroll-ml"],
  "scroll-my": ["scroll-mt", "scroll-mb"],
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
