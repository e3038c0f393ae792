import type { ReactNode } from 'react';

type Tone = 'info' | 'ok' | 'signal' | 'danger';

const tones: Record<Tone, string> = {
  info: 'border-accent/25 bg-accent-wash/60 text-accent-strong',
  ok: 'border-ok/25 bg-ok-wash text-ok',
  signal: 'border-signal/30 bg-signal-wash text-signal-ink',
  danger: 'border-danger/30 bg-danger-wash text-danger',
};

/** A short boxed message inside a page. Never a pop-up; the page carries it until it no longer applies. */
export function Notice({ tone = 'info', title, children, className = '' }: { tone?: Tone; title?: ReactNode; children?: ReactNode; className?: string }) {
  return (
    <div role={tone === 'danger' ? 'alert' : 'note'} className={`rounded border px-3 py-2 text-sm ${tones[tone]} ${className}`}>
      {title && <p className="font-semibold">{title}</p>}
      {children && <div className={title ? 'mt-0.5' : ''}>{children}</div>}
    </div>
  );
}

/**
 * A quiet caution: a left rule in the signal colour and small text. For things a careful
 * engineer should keep in mind (results footer, gas force entry, release step).
 */
export function Caution({ children, className = '' }: { children: ReactNode; className?: string }) {
  return (
    <p role="note" className={`border-l-2 border-signal pl-2.5 text-xs leading-relaxed text-ink-soft ${className}`}>
      {children}
    </p>
  );
}
