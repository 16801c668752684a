/**
 * The Dilutrace name mark: the wordmark with its "l" drawn as a volumetric flask —
 * a narrow neck carrying one copper graduation ring above a flat-bottomed bulb.
 * Sized in em, so it follows the surrounding font size.
 */
export function NameMark({ className = '' }: { className?: string }) {
  return (
    <span role="img" aria-label="Dilutrace" className={`inline-flex items-baseline font-bold tracking-tight ${className}`}>
      <span aria-hidden="true">Di</span>
      <svg aria-hidden="true" viewBox="0 0 50 74" className="mx-[0.02em] h-[0.74em] w-[0.5em] self-baseline" style={{ verticalAlign: 'baseline' }}>
        <path
          d="M20 2h10v41c9 3 15 10 15 19 0 7-3 10-7 10H12c-4 0-7-3-7-10 0-9 6-16 15-19z"
          fill="currentColor"
        />
        <rect x="13" y="16" width="24" height="5" rx="2.5" fill="var(--color-accent)" />
        <path d="M9 61h32" stroke="var(--color-paper)" strokeWidth="3" strokeLinecap="round" opacity="0.55" />
      </svg>
      <span aria-hidden="true">utrace</span>
    </span>
  );
}
