/** The Linkyard mark: two chain links, one in sky blue. */
export function Logo({ className = "h-9 w-9" }: { className?: string }) {
  return (
    <svg viewBox="0 0 64 64" className={className} aria-hidden="true">
      <rect width="64" height="64" rx="12" fill="#1b2f5e" />
      <rect x="9" y="21" width="28" height="22" rx="11" fill="none" stroke="#8ec5ff" strokeWidth="6" />
      <rect x="27" y="21" width="28" height="22" rx="11" fill="none" stroke="#ffffff" strokeWidth="6" />
      <path d="M27 32h10" stroke="#8ec5ff" strokeWidth="6" strokeLinecap="round" />
    </svg>
  );
}

export function Wordmark() {
  return (
    <span className="flex items-center gap-2 text-2xl font-bold tracking-tight">
      <Logo />
      Linkyard
    </span>
  );
}
