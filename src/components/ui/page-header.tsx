import type { ReactNode } from 'react';

/** Page title, an optional line under it, and actions on the right. One per page. */
export function PageHeader({ title, detail, actions, eyebrow }: { title: ReactNode; detail?: ReactNode; actions?: ReactNode; eyebrow?: ReactNode }) {
  return (
    <header className="mb-5 flex flex-wrap items-end justify-between gap-x-6 gap-y-3 border-b border-rule pb-3">
      <div className="min-w-0">
        {eyebrow && <p className="text-xs font-medium tracking-wide text-ink-faint uppercase">{eyebrow}</p>}
        <h1 className="text-xl font-semibold text-ink">{title}</h1>
        {detail && <div className="mt-0.5 max-w-prose text-sm text-ink-soft">{detail}</div>}
      </div>
      {actions && <div className="flex flex-wrap items-center gap-2">{actions}</div>}
    </header>
  );
}

/** A titled block inside a page. */
export function Section({ title, actions, children, className = '' }: { title: ReactNode; actions?: ReactNode; children: ReactNode; className?: string }) {
  return (
    <section className={`mb-7 ${className}`}>
      <div className="mb-2 flex items-center justify-between gap-4">
        <h2 className="text-lg font-semibold">{title}</h2>
        {actions}
      </div>
      {children}
    </section>
  );
}
