/** The Rungwise mark: two rails and three rising rungs, the top one lit. */
export function LogoMark({ size = 28, className }: { size?: number; className?: string }) {
  return (
    <svg width={size} height={size} viewBox="0 0 32 32" role="img" aria-label="Rungwise" className={className}>
      <rect x="1" y="1" width="30" height="30" rx="8" fill="var(--moss)" />
      <path d="M10 26 L13 6 M22 26 L19 6" stroke="var(--paper)" strokeWidth="2.4" strokeLinecap="round" />
      <path d="M11 21 H21" stroke="var(--paper)" strokeWidth="2.4" strokeLinecap="round" opacity="0.55" />
      <path d="M11.8 15.5 H20.2" stroke="var(--paper)" strokeWidth="2.4" strokeLinecap="round" opacity="0.8" />
      <path d="M12.6 10 H19.4" stroke="var(--ember)" strokeWidth="2.8" strokeLinecap="round" />
    </svg>
  );
}

export function Wordmark() {
  return (
    <span className="inline-flex items-center gap-2 font-display text-xl font-bold tracking-tight text-ink">
      <LogoMark />
      Rungwise
    </span>
  );
}
