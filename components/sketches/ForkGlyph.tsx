/** A branching line: marks a fork (a sketch copied from another sketch's version). */
export function ForkGlyph({ className = "" }: { className?: string }) {
  return (
    <svg width="12" height="12" viewBox="0 0 12 12" aria-hidden="true" className={`inline-block shrink-0 align-[-1px] ${className}`}>
      <circle cx="3" cy="2.2" r="1.4" fill="none" stroke="currentColor" strokeWidth="1.1" />
      <circle cx="9" cy="2.2" r="1.4" fill="none" stroke="currentColor" strokeWidth="1.1" />
      <circle cx="3" cy="9.8" r="1.4" fill="none" stroke="currentColor" strokeWidth="1.1" />
      <path d="M3 3.6v4.8M9 3.6c0 2.6-6 2-6 4.8" fill="none" stroke="currentColor" strokeWidth="1.1" />
    </svg>
  );
}
