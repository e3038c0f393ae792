/** Said once, at the top of a workspace, for people who can read but not change it. */
export function ReadOnlyBanner({ children }: { children?: string }) {
  return (
    <div role="note" aria-label="Read-only" className="flex items-center gap-2 border-b border-rule bg-paper-sunk px-6 py-1.5 text-sm text-ink-soft">
      <svg viewBox="0 0 16 16" className="size-3.5 shrink-0 text-ink-faint" aria-hidden="true">
        <path d="M1.5 8s2.4-4.5 6.5-4.5S14.5 8 14.5 8s-2.4 4.5-6.5 4.5S1.5 8 1.5 8Z" fill="none" stroke="currentColor" strokeWidth="1.4" />
        <circle cx="8" cy="8" r="2" fill="currentColor" />
      </svg>
      <span>{children ?? 'You can read everything in this workspace. Changes are made by its engineers, leads and admins.'}</span>
    </div>
  );
}
