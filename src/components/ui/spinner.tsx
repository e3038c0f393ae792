/** A small ring that turns while something loads; `label` is read by screen readers. */
export function Spinner({ label = 'Loading', className = '' }: { label?: string; className?: string }) {
  return (
    <span role="status" className={`inline-flex items-center gap-2 text-ink-faint ${className}`}>
      <svg viewBox="0 0 16 16" className="size-3.5 animate-spin" aria-hidden="true">
        <circle cx="8" cy="8" r="6" fill="none" stroke="currentColor" strokeOpacity="0.25" strokeWidth="2" />
        <path d="M8 2a6 6 0 0 1 6 6" fill="none" stroke="currentColor" strokeWidth="2" strokeLinecap="round" />
      </svg>
      <span className="sr-only">{label}</span>
    </span>
  );
}

/** A spinner with its words, for a page or panel that is still loading. */
export function Loading({ what }: { what: string }) {
  return (
    <p className="flex items-center gap-2 py-6 text-sm text-ink-faint">
      <Spinner label={`Loading ${what}`} />
      <span>Loading {what}…</span>
    </p>
  );
}
