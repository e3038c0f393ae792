/** The Ridewright mark: one damped wave settling onto its line. */
export function Mark({ className = 'size-5', wave = 'var(--color-paper)' }: { className?: string; wave?: string }) {
  return (
    <svg viewBox="0 0 24 24" className={className} aria-hidden="true">
      <rect width="24" height="24" rx="4" fill="currentColor" />
      <path d="M3 12c1.6-7 3.2-7 4.8 0s3.2 5 4.6 0 2.6-3 3.8 0 2.2 1.6 4.8 0" fill="none" stroke={wave} strokeWidth="1.8" strokeLinecap="round" />
    </svg>
  );
}

export function Wordmark({ tone = 'ink' }: { tone?: 'ink' | 'paper' }) {
  return (
    <span className={`inline-flex items-center gap-2 ${tone === 'paper' ? 'text-paper' : 'text-accent'}`}>
      <Mark wave={tone === 'paper' ? 'var(--color-accent-strong)' : undefined} />
      <span className={`text-lg font-semibold tracking-tight ${tone === 'paper' ? 'text-paper' : 'text-ink'}`}>Ridewright</span>
    </span>
  );
}
