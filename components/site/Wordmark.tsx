import Link from "next/link";

/** The product mark: a beam balanced on a point, a jet on one side and a weight on the other. */
export function ProductMark({ size = 28, className }: { size?: number; className?: string }) {
  return (
    <svg className={className} width={size} height={size} viewBox="0 0 28 28" aria-hidden="true">
      <path d="M3 13h22" stroke="currentColor" strokeWidth="2.2" strokeLinecap="round" />
      <path d="M14 14l-4 7h8z" fill="none" stroke="currentColor" strokeWidth="1.6" strokeLinejoin="round" />
      <path d="M7 21h14" stroke="currentColor" strokeWidth="1.2" />
      <rect x="19" y="6.5" width="5" height="5" className="fill-accent" rx="0.5" />
      <path d="M8 10V4.5M8 4.5l-2 2.3M8 4.5l2 2.3" className="stroke-reaction" strokeWidth="1.5" fill="none" strokeLinecap="round" />
    </svg>
  );
}

/** The mark and the name, linking home. `compact`: on phone widths only the mark shows (the name stays for screen readers). */
export function Wordmark({ href = "/", compact = false }: { href?: string; compact?: boolean }) {
  return (
    <Link href={href} className="flex items-center gap-2 text-ink no-underline" aria-label="Counterpoise home">
      <ProductMark className="shrink-0" />
      <span className={`text-[17px] font-semibold tracking-tight ${compact ? "max-sm:sr-only" : ""}`}>Counterpoise</span>
    </Link>
  );
}
