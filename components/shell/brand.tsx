import Link from "next/link";

/** The mark: four small patches, one per tire contact patch. */
export function BrandMark({ className = "size-7" }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" className={className} aria-hidden>
      <rect x="3" y="3" width="11" height="11" rx="3" fill="#1e625c" />
      <rect x="18" y="3" width="11" height="11" rx="3" fill="#2d978b" />
      <rect x="3" y="18" width="11" height="11" rx="3" fill="#2d978b" />
      <rect x="18" y="18" width="11" height="11" rx="3" fill="#1e625c" />
    </svg>
  );
}

export function Brand({ href = "/" }: { href?: string }) {
  return (
    <Link href={href} className="flex items-center gap-2 text-lg font-extrabold tracking-tight text-asphalt-950 no-underline">
      <BrandMark />
      Fourpatch
    </Link>
  );
}
