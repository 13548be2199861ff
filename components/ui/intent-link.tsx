"use client";
// `next/link` that fetches its page ahead only when the reader shows intent:
// a pointer over it, a finger on it, or keyboard focus (the pattern of
// Next.js's own prefetching guide). The default fetches every link the
// moment it scrolls into view: on the overview that is two server renders
// per vehicle and set, on a phone's data, and their answers are decoded on
// the main thread while the page is still starting (about half of a page's
// blocking time under Lighthouse's phone throttling). A touch starts the
// fetch some 100 ms before the tap ends, which is most of what a prefetch buys.
import Link from "next/link";
import { useState, type ComponentProps } from "react";

type Props = ComponentProps<typeof Link>;

export function IntentLink({ prefetch, onMouseEnter, onTouchStart, onFocus, ...props }: Props) {
  const [wanted, setWanted] = useState(false);
  const want = () => {
    if (!wanted) setWanted(true);
  };
  return (
    <Link
      {...props}
      // false until wanted; then the caller's choice (null: Next's own default).
      prefetch={prefetch === false || !wanted ? false : (prefetch ?? null)}
      onMouseEnter={(e) => {
        want();
        onMouseEnter?.(e);
      }}
      onTouchStart={(e) => {
        want();
        onTouchStart?.(e);
      }}
      onFocus={(e) => {
        want();
        onFocus?.(e);
      }}
    />
  );
}

export default IntentLink;
