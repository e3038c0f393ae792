import type { ReactNode } from 'react';

/** A role or state written plainly in a small outlined tag. */
export function Tag({ children, tone = 'plain' }: { children: ReactNode; tone?: 'plain' | 'accent' | 'signal' }) {
  const look = {
    plain: 'border-rule-strong text-ink-soft',
    accent: 'border-accent/40 text-accent-strong bg-accent-wash/60',
    signal: 'border-signal/40 text-signal-ink bg-signal-wash',
  }[tone];
  return <span className={`inline-flex h-5 items-center rounded-sm border px-1.5 text-xs font-medium whitespace-nowrap ${look}`}>{children}</span>;
}
