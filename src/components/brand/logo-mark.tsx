/** Filmsheet's mark: a sheet with three air-film strokes thinning towards its leading edge. */
export function LogoMark({ className = "size-7" }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" className={className} aria-hidden="true">
      <rect x="1" y="1" width="30" height="30" rx="8" fill="var(--fs-accent)" />
      <path d="M8 10.5h16" stroke="var(--fs-accent-ink)" strokeWidth="2.4" strokeLinecap="round" />
      <path d="M8 16h12" stroke="var(--fs-accent-ink)" strokeWidth="2.4" strokeLinecap="round" opacity="0.8" />
      <path d="M8 21.5h7" stroke="var(--fs-accent-ink)" strokeWidth="2.4" strokeLinecap="round" opacity="0.6" />
    </svg>
  );
}
