import type { ReactNode } from 'react';

/** A chart's frame: a title, a line saying what is drawn, optional controls on the right. */
export function ChartCard({ title, detail, controls, children, className = '' }: { title: string; detail?: ReactNode; controls?: ReactNode; children: ReactNode; className?: string }) {
  return (
    <section aria-label={title} className={`min-w-0 rounded border border-rule bg-paper-raised px-3 pt-2 pb-1 ${className}`}>
      <header className="mb-1 flex flex-wrap items-baseline justify-between gap-x-3 gap-y-1 pr-20">
        <div className="min-w-0">
          <h3 className="text-sm font-semibold text-ink">{title}</h3>
          {detail && <p className="text-2xs text-ink-faint">{detail}</p>}
        </div>
        {controls}
      </header>
      <div className="[&_.u-legend]:!text-[11px] [&_.u-legend]:leading-tight [&_.u-legend_.u-series]:!py-0 [&_.u-legend_th]:!font-normal">{children}</div>
    </section>
  );
}
