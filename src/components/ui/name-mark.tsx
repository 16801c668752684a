/**
 * The Dilutrace name mark: the wordmark with its "l" drawn as a volumetric flask —
 * a narrow neck carrying one copper graduation ring above a flat-bottomed bulb.
 * Sized in em, so it follows the surrounding font size.
 */
export function NameMark({ className = '' }: { className?: string }) {
  return (
    <span
      role="img"
      aria-label="Dilutrace"
      className={`inline-flex items-baseline font-bold tracking-tight ${className}`}
    >
      <span aria-hidden="true">Di</span>
      <svg aria-hidden="true" viewBox="0 0 56 76" className="mx-[0.01em] h-[0.76em] w-[0.56em]">
        <path d="M22 0h12v42c12 3 19 11 19 20 0 9-4 14-11 14H14C7 76 3 71 3 62c0-9 7-17 19-20z" fill="currentColor" />
        <rect x="13" y="13" width="30" height="8" rx="4" fill="var(--color-accent)" />
      </svg>
      <span aria-hidden="true">utrace</span>
    </span>
  );
}
