import Link from "next/link";
import { buttonVariants } from "@/components/ui/button-variants";

/** Forward paging by cursor; "first page" goes back to the start. */
export function Pager({ base, q, next, hasPrev }: { base: string; q: string; next: string | null; hasPrev: boolean }) {
  const href = (cursor?: string) => {
    const p = new URLSearchParams();
    if (q) p.set("q", q);
    if (cursor) p.set("cursor", cursor);
    const s = p.toString();
    return s ? `${base}?${s}` : base;
  };
  return (
    <nav aria-label="Pages" className="mt-4 flex flex-wrap gap-2">
      {hasPrev ? (
        <Link href={href()} className={buttonVariants({ variant: "ghost", size: "sm" })}>
          First page
        </Link>
      ) : null}
      {next ? (
        <Link href={href(next)} className={buttonVariants({ variant: "secondary", size: "sm" })}>
          Next page
        </Link>
      ) : null}
    </nav>
  );
}
