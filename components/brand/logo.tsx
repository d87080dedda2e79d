/** Warmstead's mark: a gabled house whose wall is a warm ember band. Drawn inline, no asset fetch. */
export function Logo({ className = "h-8 w-8" }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" className={className} aria-hidden="true" focusable="false">
      <path d="M4 15 16 5l12 10" fill="none" stroke="currentColor" strokeWidth="2.6" strokeLinecap="round" strokeLinejoin="round" />
      <rect x="8" y="15" width="16" height="12" rx="1.5" fill="#d9692f" />
      <rect x="8" y="19" width="16" height="2.4" fill="#faf7f2" opacity="0.55" />
      <rect x="8" y="23.4" width="16" height="1.6" fill="#faf7f2" opacity="0.35" />
    </svg>
  );
}

export function Wordmark() {
  return (
    <span className="flex items-center gap-2 text-spruce-800">
      <Logo />
      <span className="font-display text-xl font-bold tracking-tight">Warmstead</span>
    </span>
  );
}
